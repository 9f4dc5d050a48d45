import { ApiProperty } from '@nestjs/swagger';
import type { User } from '../../users/entities/user.entity';

export class CustomerResponse {
  @ApiProperty({ format: 'uuid' })
  id!: string;

  @ApiProperty({ example: 'Ari Pellow' })
  name!: string;

  @ApiProperty({ example: 'ari.pellow@tallowgate.example' })
  email!: string;

  @ApiProperty({ type: String, format: 'date-time' })
  createdAt!: string;

  static from(user: User): CustomerResponse {
    return Object.assign(new CustomerResponse(), {
      id: user.id,
      name: user.name,
      email: user.email,
      createdAt: user.createdAt.toISOString(),
    });
  }
}

export class CustomerListResponse {
  @ApiProperty({ type: [CustomerResponse] })
  items!: CustomerResponse[];
}
