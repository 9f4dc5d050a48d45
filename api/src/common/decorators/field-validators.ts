/** Small class-validator building blocks with the house's short field messages. */
import { applyDecorators } from '@nestjs/common';
import { Transform } from 'class-transformer';
import {
  IsBoolean,
  IsInt,
  IsNumber,
  IsString,
  Length,
  Max,
  Min,
  ValidateBy,
  type ValidationOptions,
} from 'class-validator';

/** A finite number (at most `decimals` decimals) from min to max. */
export function NumberInRange(min: number, max: number, unit = '', decimals?: number) {
  const suffix = unit ? ` ${unit}` : '';
  return applyDecorators(
    IsNumber(
      { allowNaN: false, allowInfinity: false, maxDecimalPlaces: decimals },
      {
        message:
          decimals === undefined
            ? 'must be a number'
            : `must be a number with at most ${decimals} decimals`,
      },
    ),
    Min(min, { message: `must be ${min}${suffix} or more` }),
    Max(max, { message: `must be ${max}${suffix} or less` }),
  );
}

/** A whole number from min to max. */
export function WholeNumberInRange(min: number, max: number, unit = '') {
  const suffix = unit ? ` ${unit}` : '';
  return applyDecorators(
    IsInt({ message: 'must be a whole number' }),
    Min(min, { message: `must be ${min}${suffix} or more` }),
    Max(max, { message: `must be ${max}${suffix} or less` }),
  );
}

/** Whole or half inches (rims are made in half-inch steps). */
export function HalfInchSteps(options?: ValidationOptions) {
  return ValidateBy(
    {
      name: 'halfInchSteps',
      validator: {
        validate: (value: unknown) => typeof value === 'number' && Number.isInteger(value * 2),
        defaultMessage: () => 'must be in whole or half inches',
      },
    },
    options,
  );
}

export function BooleanField() {
  return IsBoolean({ message: 'must be true or false' });
}

/** Trimmed text of min..max characters. */
export function TrimmedText(min: number, max: number) {
  return applyDecorators(
    Transform(({ value }: { value: unknown }) =>
      typeof value === 'string' ? value.trim() : value,
    ),
    IsString({ message: 'must be text' }),
    Length(min, max, {
      message:
        min === 0
          ? `must be at most ${max} characters`
          : min === max
            ? `must be ${min} characters`
            : `must be ${min} to ${max} characters`,
    }),
  );
}

/** "must be one of a, b, c". */
export function oneOfMessage(values: readonly string[]): string {
  return `must be one of ${values.join(', ')}`;
}
