import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsBoolean, IsOptional, IsString, Length } from 'class-validator';
import type { StaffRole } from '../../users/user-role';
import { StaffRoleField } from './staff-role.field';

export class UpdateStaffMemberDto {
  @ApiPropertyOptional({ minLength: 1, maxLength: 100 })
  @IsOptional()
  @Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value))
  @IsString({ message: 'must be text' })
  @Length(1, 100, { message: 'must be 1 to 100 characters' })
  name?: string;

  @IsOptional()
  @StaffRoleField(false)
  role?: StaffRole;

  @ApiPropertyOptional()
  @IsOptional()
  @IsBoolean({ message: 'must be true or false' })
  active?: boolean;
}
