import { ApiProperty } from '@nestjs/swagger';
import type { User } from '../entities/user.entity';
import { ROLES, type Role } from '../user-role';

export class UserResponse {
  @ApiProperty({ format: 'uuid' })
  id!: string;

  @ApiProperty({ example: 'customer@liftwright.example' })
  email!: string;

  @ApiProperty({ example: 'Robin Yarrow' })
  name!: string;

  @ApiProperty({ enum: ROLES, enumName: 'Role' })
  role!: Role;

  static from(user: User): UserResponse {
    return Object.assign(new UserResponse(), {
      id: user.id,
      email: user.email,
      name: user.name,
      role: user.role,
    });
  }
}
