import { ApiProperty } from '@nestjs/swagger';
import { UserResponse } from '../../users/dto/user.response';

/** After sign-in or register: the user and the new session's CSRF token (use it from now on). */
export class AuthSessionResponse {
  @ApiProperty({ type: UserResponse })
  user!: UserResponse;

  @ApiProperty()
  csrfToken!: string;
}
