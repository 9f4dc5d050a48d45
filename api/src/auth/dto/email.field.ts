import { applyDecorators } from '@nestjs/common';
import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsEmail, IsString, MaxLength } from 'class-validator';

/** An e-mail address field: trimmed, lower-cased, checked. */
export const EmailField = () =>
  applyDecorators(
    ApiProperty({ example: 'customer@liftwright.example', maxLength: 254 }),
    Transform(({ value }: { value: unknown }) =>
      typeof value === 'string' ? value.trim().toLowerCase() : value,
    ),
    IsString({ message: 'must be an e-mail address' }),
    MaxLength(254, { message: 'must be at most 254 characters' }),
    IsEmail({}, { message: 'must be an e-mail address' }),
  );
