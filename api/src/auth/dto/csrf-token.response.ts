import { ApiProperty } from '@nestjs/swagger';

export class CsrfTokenResponse {
  @ApiProperty({
    description: 'Send it in the x-csrf-token header of every POST, PUT, PATCH and DELETE',
  })
  csrfToken!: string;
}
