import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

/** The one JSON body of every non-2xx answer. */
export class ErrorResponse {
  @ApiProperty({ example: 400 })
  statusCode!: number;

  @ApiProperty({ example: 'Bad Request' })
  error!: string;

  @ApiProperty({ example: 'Some fields are not valid' })
  message!: string;

  @ApiPropertyOptional({
    description: 'Only for validation errors: messages per field, nested fields as "a.b"',
    example: { email: ['must be an e-mail address'] },
    type: 'object',
    additionalProperties: { type: 'array', items: { type: 'string' } },
  })
  fieldErrors?: Record<string, string[]>;

  @ApiProperty({ example: '0b7e3c1e-8d55-4a53-9d8e-0c2b1f1f3a10' })
  requestId!: string;
}
