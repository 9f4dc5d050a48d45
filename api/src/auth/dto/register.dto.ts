import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsString, Length } from 'class-validator';
import { EmailField } from './email.field';
import { NewPasswordField } from './password.field';

export class RegisterDto {
  @EmailField()
  email!: string;

  @NewPasswordField()
  password!: string;

  @ApiProperty({ minLength: 1, maxLength: 100, example: 'Robin Yarrow' })
  @Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value))
  @IsString({ message: 'must be text' })
  @Length(1, 100, { message: 'must be 1 to 100 characters' })
  name!: string;
}
