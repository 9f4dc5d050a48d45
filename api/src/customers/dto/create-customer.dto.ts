import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsString, Length } from 'class-validator';
import { EmailField } from '../../auth/dto/email.field';

/** A walk-in customer made at the desk; they choose their password from the e-mailed link. */
export class CreateCustomerDto {
  @ApiProperty({ minLength: 1, maxLength: 100, example: 'Ari Pellow' })
  @Transform(({ value }: { value: unknown }) =>
    typeof value === 'string' ? value.trim().replace(/\s+/g, ' ') : value,
  )
  @IsString({ message: 'must be text' })
  @Length(1, 100, { message: 'must be 1 to 100 characters' })
  name!: string;

  @EmailField()
  email!: string;
}
