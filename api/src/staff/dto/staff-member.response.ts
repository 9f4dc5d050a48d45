import { ApiProperty } from '@nestjs/swagger';
import type { User } from '../../users/entities/user.entity';
import { STAFF_ROLES, type StaffRole } from '../../users/user-role';

export class StaffMemberResponse {
  @ApiProperty({ format: 'uuid' })
  id!: string;

  @ApiProperty({ example: 'desk@liftwright.example' })
  email!: string;

  @ApiProperty({ example: 'Bea Corran' })
  name!: string;

  @ApiProperty({ enum: STAFF_ROLES, enumName: 'StaffRole' })
  role!: StaffRole;

  @ApiProperty()
  active!: boolean;

  @ApiProperty({ type: String, format: 'date-time' })
  createdAt!: string;

  static from(user: User): StaffMemberResponse {
    const role = STAFF_ROLES.find((staffRole) => staffRole === user.role);
    // The staff service only ever hands over non-customer accounts.
    if (!role) throw new Error('A customer account is not a staff member');
    return Object.assign(new StaffMemberResponse(), {
      id: user.id,
      email: user.email,
      name: user.name,
      role,
      active: user.active,
      createdAt: user.createdAt.toISOString(),
    });
  }
}
