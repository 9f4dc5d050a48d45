import { applyDecorators } from '@nestjs/common';
import { ApiProperty } from '@nestjs/swagger';
import { IsIn } from 'class-validator';
import { STAFF_ROLES } from '../../users/user-role';

export const StaffRoleField = (required: boolean) =>
  applyDecorators(
    ApiProperty({ enum: STAFF_ROLES, enumName: 'StaffRole', required }),
    IsIn(STAFF_ROLES, { message: `must be one of ${STAFF_ROLES.join(', ')}` }),
  );
