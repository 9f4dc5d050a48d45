import { Body, Controller, Get, Param, Patch, Post } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
} from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ErrorResponse } from '../common/filters/error.response';
import { User } from '../users/entities/user.entity';
import { CreateStaffMemberDto } from './dto/create-staff-member.dto';
import { StaffListResponse } from './dto/staff-list.response';
import { StaffMemberIdParams } from './dto/staff-member-id.params';
import { StaffMemberResponse } from './dto/staff-member.response';
import { UpdateStaffMemberDto } from './dto/update-staff-member.dto';
import { StaffService } from './staff.service';

@ApiTags('staff')
@Controller('staff')
export class StaffController {
  constructor(private readonly staff: StaffService) {}

  @Roles('manager')
  @Get()
  @ApiOperation({ summary: 'Every account whose role is not customer' })
  @ApiOkResponse({ type: StaffListResponse })
  list(): Promise<StaffListResponse> {
    return this.staff.list();
  }

  @Roles('manager')
  @Post()
  @ApiOperation({ summary: 'Create a staff account' })
  @ApiCreatedResponse({ type: StaffMemberResponse })
  @ApiBadRequestResponse({ type: ErrorResponse })
  @ApiConflictResponse({ description: 'E-mail already registered', type: ErrorResponse })
  create(@Body() dto: CreateStaffMemberDto): Promise<StaffMemberResponse> {
    return this.staff.create(dto);
  }

  @Roles('manager')
  @Patch(':id')
  @ApiOperation({ summary: 'Rename, change the role of, or switch off a staff account' })
  @ApiOkResponse({ type: StaffMemberResponse })
  @ApiBadRequestResponse({
    description: 'Invalid fields, or demoting/deactivating yourself',
    type: ErrorResponse,
  })
  @ApiNotFoundResponse({ type: ErrorResponse })
  update(
    @Param() params: StaffMemberIdParams,
    @Body() dto: UpdateStaffMemberDto,
    @CurrentUser() manager: User,
  ): Promise<StaffMemberResponse> {
    return this.staff.update(params.id, dto, manager);
  }
}
