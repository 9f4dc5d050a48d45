import { Body, Controller, Delete, Get, Param, Patch, Post, Put } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
} from '@nestjs/swagger';
import { Roles } from '../common/decorators/roles.decorator';
import { IdParams } from '../common/dto/id.params';
import { ErrorResponse } from '../common/filters/error.response';
import { CreateBayDto } from './dto/create-bay.dto';
import { CreateClosureDto } from './dto/create-closure.dto';
import { HolidayDateParams, HolidayOverrideDto } from './dto/holiday-override.dto';
import { UpdateBayDto } from './dto/update-bay.dto';
import { UpdateWorkshopCalendarDto } from './dto/update-workshop-calendar.dto';
import { WorkshopSetupResponse } from './dto/workshop-setup.response';
import { WorkshopSetupService } from './workshop-setup.service';

const NOTHING_CHANGED =
  'fieldErrors keyed like the body (e.g. "openingHours[2].closesAt"); nothing changed';

/** Manage → Workshop: the manager changes it, the desk reads it. Every change answers the whole set-up. */
@ApiTags('workshop')
@Controller('workshop')
export class WorkshopSetupController {
  constructor(private readonly setup: WorkshopSetupService) {}

  @Roles('manager', 'desk')
  @Get('setup')
  @ApiOperation({
    summary:
      'Calendar settings, the week’s hours, bays, closures, public holidays of the next 12 months',
  })
  @ApiOkResponse({ type: WorkshopSetupResponse })
  read(): Promise<WorkshopSetupResponse> {
    return this.setup.setup();
  }

  @Roles('manager')
  @Put('calendar')
  @ApiOperation({
    summary:
      'Replace the time zone, holiday region, booking settings and the 7 days of hours; set the cancellation policy',
  })
  @ApiOkResponse({ type: WorkshopSetupResponse })
  @ApiBadRequestResponse({ description: NOTHING_CHANGED, type: ErrorResponse })
  updateCalendar(@Body() dto: UpdateWorkshopCalendarDto): Promise<WorkshopSetupResponse> {
    return this.setup.updateCalendar(dto);
  }

  @Roles('manager')
  @Post('bays')
  @ApiOperation({ summary: 'Add a bay (switched on, placed last)' })
  @ApiCreatedResponse({ type: WorkshopSetupResponse })
  @ApiBadRequestResponse({
    description: 'Invalid fields or a name already taken',
    type: ErrorResponse,
  })
  createBay(@Body() dto: CreateBayDto): Promise<WorkshopSetupResponse> {
    return this.setup.createBay(dto);
  }

  @Roles('manager')
  @Patch('bays/:id')
  @ApiOperation({
    summary: 'Rename a bay, change its kind, move it in the order, switch it on or off',
  })
  @ApiOkResponse({ type: WorkshopSetupResponse })
  @ApiBadRequestResponse({
    description: 'Invalid fields or a name already taken',
    type: ErrorResponse,
  })
  @ApiNotFoundResponse({ type: ErrorResponse })
  @ApiConflictResponse({
    description: 'Switching off, or changing the kind of, a bay with bookings ahead',
    type: ErrorResponse,
  })
  updateBay(@Param() params: IdParams, @Body() dto: UpdateBayDto): Promise<WorkshopSetupResponse> {
    return this.setup.updateBay(params.id, dto);
  }

  @Roles('manager')
  @Post('closures')
  @ApiOperation({ summary: 'Shut the workshop from one date to another (both included)' })
  @ApiCreatedResponse({ type: WorkshopSetupResponse })
  @ApiBadRequestResponse({ description: NOTHING_CHANGED, type: ErrorResponse })
  createClosure(@Body() dto: CreateClosureDto): Promise<WorkshopSetupResponse> {
    return this.setup.createClosure(dto);
  }

  @Roles('manager')
  @Delete('closures/:id')
  @ApiOperation({ summary: 'Remove a closure' })
  @ApiOkResponse({ type: WorkshopSetupResponse })
  @ApiNotFoundResponse({ type: ErrorResponse })
  deleteClosure(@Param() params: IdParams): Promise<WorkshopSetupResponse> {
    return this.setup.deleteClosure(params.id);
  }

  @Roles('manager')
  @Put('holidays/:date')
  @ApiOperation({
    summary: 'Open on a public holiday anyway (usual hours), or stay shut on it (the default)',
  })
  @ApiOkResponse({ type: WorkshopSetupResponse })
  @ApiBadRequestResponse({
    description: 'fieldErrors.date when the date is no public holiday of the region',
    type: ErrorResponse,
  })
  setHoliday(
    @Param() params: HolidayDateParams,
    @Body() dto: HolidayOverrideDto,
  ): Promise<WorkshopSetupResponse> {
    return this.setup.setHoliday(params.date, dto);
  }
}
