import { Body, Controller, Get, Param, Patch, Post } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiCreatedResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
} from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { IdParams } from '../common/dto/id.params';
import { ErrorResponse } from '../common/filters/error.response';
import { User } from '../users/entities/user.entity';
import { CustomerVehiclesService } from './customer-vehicles.service';
import { CreateCustomerVehicleDto } from './dto/create-customer-vehicle.dto';
import {
  CustomerVehicleListResponse,
  CustomerVehicleResponse,
} from './dto/customer-vehicle.response';
import { UpdateCustomerVehicleDto } from './dto/update-customer-vehicle.dto';

@ApiTags('my vehicles')
@Controller('my/vehicles')
export class CustomerVehiclesController {
  constructor(private readonly vehicles: CustomerVehiclesService) {}

  @Roles('customer')
  @Get()
  @ApiOperation({ summary: "The signed-in customer's own vehicles" })
  @ApiOkResponse({ type: CustomerVehicleListResponse })
  list(@CurrentUser() user: User): Promise<CustomerVehicleListResponse> {
    return this.vehicles.list(user);
  }

  @Roles('customer')
  @Post()
  @ApiOperation({ summary: 'Add a vehicle to my vehicles' })
  @ApiCreatedResponse({ type: CustomerVehicleResponse })
  @ApiBadRequestResponse({ type: ErrorResponse })
  create(
    @CurrentUser() user: User,
    @Body() dto: CreateCustomerVehicleDto,
  ): Promise<CustomerVehicleResponse> {
    return this.vehicles.create(user, dto);
  }

  @Roles('customer')
  @Patch(':id')
  @ApiOperation({ summary: "Change one of my vehicles (another customer's id is 404)" })
  @ApiOkResponse({ type: CustomerVehicleResponse })
  @ApiBadRequestResponse({ type: ErrorResponse })
  @ApiNotFoundResponse({ type: ErrorResponse })
  update(
    @CurrentUser() user: User,
    @Param() params: IdParams,
    @Body() dto: UpdateCustomerVehicleDto,
  ): Promise<CustomerVehicleResponse> {
    return this.vehicles.update(user, params.id, dto);
  }
}
