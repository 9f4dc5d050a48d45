import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsOptional, IsString, IsUUID, Length, Matches } from 'class-validator';
import { WholeNumberInRange } from '../../common/decorators/field-validators';

/** Trimmed; empty text becomes null (the field is cleared). */
function optionalText(upperCase: boolean) {
  return Transform(({ value }: { value: unknown }) => {
    if (typeof value !== 'string') return value;
    const trimmed = value.trim().replace(/\s+/g, ' ');
    if (trimmed === '') return null;
    return upperCase ? trimmed.toUpperCase() : trimmed;
  });
}

export class CreateCustomerVehicleDto {
  @ApiProperty({ format: 'uuid' })
  @IsUUID('all', { message: 'must be a UUID' })
  vehicleModelId!: string;

  @ApiPropertyOptional({ type: String, nullable: true, maxLength: 60, example: 'The work ute' })
  @IsOptional()
  @optionalText(false)
  @IsString({ message: 'must be text' })
  @Length(1, 60, { message: 'must be at most 60 characters' })
  nickname?: string | null;

  @ApiPropertyOptional({
    type: String,
    nullable: true,
    example: 'TGX 42K',
    description: 'Registration plate; stored in capitals',
  })
  @IsOptional()
  @optionalText(true)
  @IsString({ message: 'must be text' })
  @Matches(/^[A-Z0-9][A-Z0-9 -]{0,9}$/, {
    message: 'must be 1 to 10 letters, digits, spaces or hyphens',
  })
  rego?: string | null;

  @ApiPropertyOptional({
    type: Number,
    nullable: true,
    example: 2019,
    description: "Model year, within the model's years",
  })
  @IsOptional()
  @WholeNumberInRange(1950, 2100)
  year?: number | null;
}
