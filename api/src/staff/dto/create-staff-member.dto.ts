import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsString, Length } from 'class-validator';
import { EmailField } from '../../auth/dto/email.field';
import { NewPasswordField } from '../../auth/dto/password.field';
import type { StaffRole } from '../../users/user-role';
import { StaffRoleField } from './staff-role.field';

export class CreateStaffMemberDto {
  @EmailField()
  email!: string;

  @ApiProperty({ minLength: 1, maxLength: 100, example: 'Bea Corran' })
  @Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value))
  @IsString({ message: 'must be text' })
  @Length(1, 100, { message: 'must be 1 to 100 characters' })
  name!: string;

  @StaffRoleField(true)
  role!: StaffRole;

  @NewPasswordField()
  password!: string;
}
