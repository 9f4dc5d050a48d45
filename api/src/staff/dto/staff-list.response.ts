import { ApiProperty } from '@nestjs/swagger';
import { StaffMemberResponse } from './staff-member.response';

export class StaffListResponse {
  @ApiProperty({ type: [StaffMemberResponse] })
  items!: StaffMemberResponse[];
}
