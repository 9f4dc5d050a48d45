import { ApiProperty } from '@nestjs/swagger';
import { UserResponse } from '../../users/dto/user.response';

export class MeResponse {
  @ApiProperty({ type: UserResponse })
  user!: UserResponse;
}
