import { UniqueConstraintViolationException } from '@mikro-orm/core';
import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable, NotFoundException } from '@nestjs/common';
import { emailTakenException } from '../auth/auth.service';
import { PasswordHasher } from '../auth/password-hasher';
import { HttpSessionService } from '../auth/session/http-session.service';
import { FieldErrorsException, type FieldErrors } from '../common/errors/field-errors.exception';
import { User } from '../users/entities/user.entity';
import { UserRepository } from '../users/user.repository';
import type { CreateStaffMemberDto } from './dto/create-staff-member.dto';
import type { StaffListResponse } from './dto/staff-list.response';
import { StaffMemberResponse } from './dto/staff-member.response';
import type { UpdateStaffMemberDto } from './dto/update-staff-member.dto';

@Injectable()
export class StaffService {
  constructor(
    private readonly em: EntityManager,
    private readonly users: UserRepository,
    private readonly hasher: PasswordHasher,
    private readonly sessions: HttpSessionService,
  ) {}

  async list(): Promise<StaffListResponse> {
    const staff = await this.users.find(
      { role: { $ne: 'customer' } },
      { orderBy: { name: 'asc', email: 'asc' } },
    );
    return { items: staff.map((user) => StaffMemberResponse.from(user)) };
  }

  async create(dto: CreateStaffMemberDto): Promise<StaffMemberResponse> {
    if ((await this.users.count({ email: dto.email })) > 0) throw emailTakenException();
    const user = new User(dto.email, dto.name, dto.role, await this.hasher.hash(dto.password));
    try {
      await this.em.persistAndFlush(user);
    } catch (error) {
      if (error instanceof UniqueConstraintViolationException) throw emailTakenException();
      throw error;
    }
    return StaffMemberResponse.from(user);
  }

  /** A manager may change anyone's name, role or active flag, but not demote or deactivate themselves. */
  async update(
    id: string,
    dto: UpdateStaffMemberDto,
    actingManager: User,
  ): Promise<StaffMemberResponse> {
    const member = await this.users.findOne({ id, role: { $ne: 'customer' } });
    if (!member) throw new NotFoundException('No staff member has this id');

    const fieldErrors: FieldErrors = {};
    const isSelf = member.id === actingManager.id;
    if (isSelf && dto.role != null && dto.role !== 'manager') {
      fieldErrors.role = ['You cannot take the manager role from yourself'];
    }
    if (isSelf && dto.active === false) {
      fieldErrors.active = ['You cannot deactivate your own account'];
    }
    if (Object.keys(fieldErrors).length > 0) {
      throw new FieldErrorsException(fieldErrors, 'You cannot demote or deactivate yourself');
    }

    if (dto.name != null) member.name = dto.name;
    if (dto.role != null) member.role = dto.role;
    const deactivated = dto.active === false && member.active;
    if (dto.active != null) member.active = dto.active;
    await this.em.flush();
    // A switched-off account is signed out everywhere at once.
    if (deactivated) await this.sessions.destroyAllForUser(member.id);
    return StaffMemberResponse.from(member);
  }
}
