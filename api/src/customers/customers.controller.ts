import { Body, Controller, Get, Post, Query } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
} from '@nestjs/swagger';
import { Roles } from '../common/decorators/roles.decorator';
import { ErrorResponse } from '../common/filters/error.response';
import { CustomersService } from './customers.service';
import { CreateCustomerDto } from './dto/create-customer.dto';
import { CustomerQueryDto } from './dto/customer-query.dto';
import { CustomerListResponse, CustomerResponse } from './dto/customer.response';

@ApiTags('customers')
@Controller('customers')
export class CustomersController {
  constructor(private readonly customers: CustomersService) {}

  @Roles('desk', 'manager')
  @Get()
  @ApiOperation({
    summary: 'Find customers by name or e-mail (any case), at most 50, by name',
  })
  @ApiOkResponse({ type: CustomerListResponse })
  @ApiBadRequestResponse({ type: ErrorResponse })
  search(@Query() query: CustomerQueryDto): Promise<CustomerListResponse> {
    return this.customers.search(query.q);
  }

  @Roles('desk', 'manager')
  @Post()
  @ApiOperation({
    summary:
      'Create a customer for a walk-in quote; they get an e-mail with a link to choose a password',
  })
  @ApiCreatedResponse({ type: CustomerResponse })
  @ApiBadRequestResponse({ type: ErrorResponse })
  @ApiConflictResponse({ description: 'E-mail already registered', type: ErrorResponse })
  create(@Body() dto: CreateCustomerDto): Promise<CustomerResponse> {
    return this.customers.create(dto);
  }
}
