import { ApiProperty } from '@nestjs/swagger';
import { IsString, Length } from 'class-validator';
import { NewPasswordField } from './password.field';

export class ConfirmPasswordResetDto {
  @ApiProperty({ description: 'The token from the e-mailed link' })
  @IsString({ message: 'This link has expired or was already used' })
  @Length(1, 200, { message: 'This link has expired or was already used' })
  token!: string;

  @NewPasswordField()
  password!: string;
}
