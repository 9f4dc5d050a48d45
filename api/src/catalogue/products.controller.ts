import { Body, Controller, Get, Param, Patch, Post, Query } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiExtraModels,
  ApiForbiddenResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
} from '@nestjs/swagger';
import { OptionalCurrentUser } from '../common/decorators/current-user.decorator';
import { Public } from '../common/decorators/public.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { IdParams } from '../common/dto/id.params';
import { ErrorResponse } from '../common/filters/error.response';
import type { User } from '../users/entities/user.entity';
import { CreateProductDto } from './dto/create-product.dto';
import { ProductQueryDto } from './dto/product-query.dto';
import { ProductListResponse, ProductResponse } from './dto/product.response';
import { UpdateProductDto } from './dto/update-product.dto';
import {
  ComponentAttributesDto,
  ServiceAttributesDto,
  SuspensionKitAttributesDto,
  TyreAttributesDto,
  WheelAttributesDto,
} from './product-attributes';
import { ProductsService } from './products.service';

@ApiTags('catalogue')
@ApiExtraModels(
  WheelAttributesDto,
  TyreAttributesDto,
  SuspensionKitAttributesDto,
  ComponentAttributesDto,
  ServiceAttributesDto,
)
@Controller('products')
export class ProductsController {
  constructor(private readonly products: ProductsService) {}

  @Public()
  @Get()
  @ApiOperation({
    summary:
      'Products (active ones unless a manager asks for all); with vehicleModelId, each with its fit verdict',
  })
  @ApiOkResponse({ type: ProductListResponse })
  @ApiBadRequestResponse({ type: ErrorResponse })
  @ApiForbiddenResponse({
    description: 'includeInactive=true by anyone but a manager',
    type: ErrorResponse,
  })
  list(
    @Query() query: ProductQueryDto,
    @OptionalCurrentUser() user: User | null,
  ): Promise<ProductListResponse> {
    return this.products.list(query, user);
  }

  @Public()
  @Get(':id')
  @ApiOperation({ summary: 'One product (a switched-off one for managers only)' })
  @ApiOkResponse({ type: ProductResponse })
  @ApiBadRequestResponse({ type: ErrorResponse })
  @ApiNotFoundResponse({ type: ErrorResponse })
  get(
    @Param() params: IdParams,
    @OptionalCurrentUser() user: User | null,
  ): Promise<ProductResponse> {
    return this.products.get(params.id, user);
  }

  @Roles('manager')
  @Post()
  @ApiOperation({ summary: 'Add a product (attributes validated for its kind)' })
  @ApiCreatedResponse({ type: ProductResponse })
  @ApiBadRequestResponse({
    description: 'fieldErrors such as "attributes.offsetMm"',
    type: ErrorResponse,
  })
  @ApiConflictResponse({ description: 'SKU taken', type: ErrorResponse })
  create(@Body() dto: CreateProductDto): Promise<ProductResponse> {
    return this.products.create(dto);
  }

  @Roles('manager')
  @Patch(':id')
  @ApiOperation({ summary: 'Change a product (the result is validated as a whole)' })
  @ApiOkResponse({ type: ProductResponse })
  @ApiBadRequestResponse({ type: ErrorResponse })
  @ApiNotFoundResponse({ type: ErrorResponse })
  @ApiConflictResponse({ description: 'SKU taken', type: ErrorResponse })
  update(@Param() params: IdParams, @Body() dto: UpdateProductDto): Promise<ProductResponse> {
    return this.products.update(params.id, dto);
  }
}
