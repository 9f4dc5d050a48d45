import { Type } from 'class-transformer';
import { IsEmail, IsInt, IsOptional, Min, ValidateNested } from 'class-validator';
import { describe, expect, it } from 'vitest';
import { FieldErrorsException } from '../errors/field-errors.exception';
import { createValidationPipe } from './validation.pipe';

class AxleDto {
  @IsInt({ message: 'must be a whole number' })
  @Min(0, { message: 'must not be negative' })
  ratingKg!: number;
}

class VehicleDto {
  @IsEmail({}, { message: 'must be an e-mail address' })
  ownerEmail!: string;

  @ValidateNested()
  @Type(() => AxleDto)
  frontAxle!: AxleDto;

  @IsOptional()
  @ValidateNested({ each: true })
  @Type(() => AxleDto)
  extraAxles?: AxleDto[];
}

async function fieldErrorsOf(value: unknown): Promise<Record<string, string[]>> {
  try {
    await createValidationPipe().transform(value, { type: 'body', metatype: VehicleDto });
  } catch (error) {
    expect(error).toBeInstanceOf(FieldErrorsException);
    return (error as FieldErrorsException).fieldErrors;
  }
  throw new Error('the pipe accepted the value');
}

describe('createValidationPipe', () => {
  it('keys nested errors as "a.b"', async () => {
    expect(await fieldErrorsOf({ ownerEmail: 'x', frontAxle: { ratingKg: -1 } })).toEqual({
      ownerEmail: ['must be an e-mail address'],
      'frontAxle.ratingKg': ['must not be negative'],
    });
  });

  it('keys list items with their position in brackets, "a[2].b"', async () => {
    expect(
      await fieldErrorsOf({
        ownerEmail: 'a@b.example',
        frontAxle: { ratingKg: 1 },
        extraAxles: [{ ratingKg: 1 }, { ratingKg: 1 }, { ratingKg: -1 }],
      }),
    ).toEqual({ 'extraAxles[2].ratingKg': ['must not be negative'] });
  });

  it('names unknown properties, nested ones too', async () => {
    expect(
      await fieldErrorsOf({
        ownerEmail: 'a@b.example',
        frontAxle: { ratingKg: 1, colour: 'red' },
        wheels: 4,
      }),
    ).toEqual({
      wheels: ['is not an expected field'],
      'frontAxle.colour': ['is not an expected field'],
    });
  });

  it('returns an instance of the DTO when valid', async () => {
    const value = await createValidationPipe().transform(
      { ownerEmail: 'a@b.example', frontAxle: { ratingKg: 1200 } },
      { type: 'body', metatype: VehicleDto },
    );
    expect(value).toBeInstanceOf(VehicleDto);
    expect((value as VehicleDto).frontAxle).toBeInstanceOf(AxleDto);
  });

  it("drops class-validator's leading property name from default messages", async () => {
    class Plain {
      @IsInt()
      count!: number;
    }
    try {
      await createValidationPipe().transform({ count: 'x' }, { type: 'body', metatype: Plain });
      throw new Error('accepted');
    } catch (error) {
      expect((error as FieldErrorsException).fieldErrors).toEqual({
        count: ['must be an integer number'],
      });
    }
  });
});
