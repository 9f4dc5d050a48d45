import { Body, Controller, Get, Param, Patch, Post, Query } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
} from '@nestjs/swagger';
import { Public } from '../common/decorators/public.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { IdParams } from '../common/dto/id.params';
import { ErrorResponse } from '../common/filters/error.response';
import { CreateVehicleModelDto } from './dto/create-vehicle-model.dto';
import { UpdateVehicleModelDto } from './dto/update-vehicle-model.dto';
import { VehicleModelQueryDto } from './dto/vehicle-model-query.dto';
import {
  VehicleMakesResponse,
  VehicleModelListResponse,
  VehicleModelResponse,
} from './dto/vehicle-model.response';
import { VehiclesService } from './vehicles.service';

@ApiTags('vehicle models')
@Controller('vehicle-models')
export class VehiclesController {
  constructor(private readonly vehicles: VehiclesService) {}

  @Public()
  @Get()
  @ApiOperation({ summary: 'Search vehicle models by words (make, model, variant), make and year' })
  @ApiOkResponse({ type: VehicleModelListResponse })
  @ApiBadRequestResponse({ type: ErrorResponse })
  list(@Query() query: VehicleModelQueryDto): Promise<VehicleModelListResponse> {
    return this.vehicles.list(query);
  }

  @Public()
  @Get('makes')
  @ApiOperation({ summary: 'Every make, A to Z' })
  @ApiOkResponse({ type: VehicleMakesResponse })
  makes(): Promise<VehicleMakesResponse> {
    return this.vehicles.makes();
  }

  @Public()
  @Get(':id')
  @ApiOperation({ summary: "A vehicle model's spec sheet" })
  @ApiOkResponse({ type: VehicleModelResponse })
  @ApiBadRequestResponse({ type: ErrorResponse })
  @ApiNotFoundResponse({ type: ErrorResponse })
  get(@Param() params: IdParams): Promise<VehicleModelResponse> {
    return this.vehicles.get(params.id);
  }

  @Roles('manager')
  @Post()
  @ApiOperation({ summary: 'Add a vehicle model' })
  @ApiCreatedResponse({ type: VehicleModelResponse })
  @ApiBadRequestResponse({ type: ErrorResponse })
  @ApiConflictResponse({ description: 'Same make, model and variant', type: ErrorResponse })
  create(@Body() dto: CreateVehicleModelDto): Promise<VehicleModelResponse> {
    return this.vehicles.create(dto);
  }

  @Roles('manager')
  @Patch(':id')
  @ApiOperation({ summary: "Change part of a vehicle model's spec sheet" })
  @ApiOkResponse({ type: VehicleModelResponse })
  @ApiBadRequestResponse({ type: ErrorResponse })
  @ApiNotFoundResponse({ type: ErrorResponse })
  @ApiConflictResponse({ description: 'Same make, model and variant', type: ErrorResponse })
  update(
    @Param() params: IdParams,
    @Body() dto: UpdateVehicleModelDto,
  ): Promise<VehicleModelResponse> {
    return this.vehicles.update(params.id, dto);
  }
}
