import { ApiProperty } from '@nestjs/swagger';
import { IsString, Length } from 'class-validator';
import { PASSWORD_MAX_LENGTH } from '../password.constants';
import { EmailField } from './email.field';

export class SignInDto {
  @EmailField()
  email!: string;

  /** Not checked for length rules here: a wrong password gets the same 401 as any other. */
  @ApiProperty({ format: 'password', maxLength: PASSWORD_MAX_LENGTH })
  @IsString({ message: 'must be text' })
  @Length(1, PASSWORD_MAX_LENGTH, { message: `must be 1 to ${PASSWORD_MAX_LENGTH} characters` })
  password!: string;
}
