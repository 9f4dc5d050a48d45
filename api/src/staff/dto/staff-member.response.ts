import { ApiProperty } from '@nestjs/swagger';
import type { User } from '../../users/entities/user.entity';
import { ROLES, type Role } from '../../users/user-role';

export class StaffMemberResponse {
  @ApiProperty({ format: 'uuid' })
  id!: string;

  @ApiProperty({ example: 'desk@liftwright.example' })
  email!: string;

  @ApiProperty({ example: 'Bea Corran' })
  name!: string;

  @ApiProperty({ enum: ROLES, enumName: 'Role' })
  role!: Role;

  @ApiProperty()
  active!: boolean;

  @ApiProperty({ type: String, format: 'date-time' })
  createdAt!: string;

  static from(user: User): StaffMemberResponse {
    return Object.assign(new StaffMemberResponse(), {
      id: user.id,
      email: user.email,
      name: user.name,
      role: user.role,
      active: user.active,
      createdAt: user.createdAt.toISOString(),
    });
  }
}
