import { applyDecorators } from '@nestjs/common';
import { Transform } from 'class-transformer';
import { ValidateBy } from 'class-validator';
import { formatTyreDesignation, parseTyreDesignation } from '../../fitment/tyre-designation';

/** Any designation the fit engine reads; the message is the parser's, naming the wrong part. */
export function ReadableTyreDesignation() {
  return applyDecorators(
    Transform(({ value }: { value: unknown }) => {
      if (typeof value !== 'string') return value;
      const parsed = parseTyreDesignation(value);
      return parsed.ok ? formatTyreDesignation(parsed.size) : value;
    }),
    ValidateBy({
      name: 'readableTyreDesignation',
      validator: {
        validate: (value: unknown) => typeof value === 'string' && parseTyreDesignation(value).ok,
        defaultMessage: (args) => {
          const value: unknown = args?.value;
          if (typeof value !== 'string') return 'must be a tyre size such as 265/65R17 112S';
          const parsed = parseTyreDesignation(value);
          return parsed.ok ? 'must be a tyre size' : parsed.error.message;
        },
      },
    }),
  );
}
