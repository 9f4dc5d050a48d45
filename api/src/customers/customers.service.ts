import { randomBytes } from 'node:crypto';
import { type FilterQuery, UniqueConstraintViolationException } from '@mikro-orm/core';
import { EntityManager } from '@mikro-orm/postgresql';
import { Injectable } from '@nestjs/common';
import { AuthService, emailTakenException } from '../auth/auth.service';
import { PasswordHasher } from '../auth/password-hasher';
import { SET_PASSWORD_TTL_MS } from '../auth/password.constants';
import { MailService } from '../mail/mail.service';
import { User } from '../users/entities/user.entity';
import { escapeLike } from '../vehicles/vehicles.service';
import type { CreateCustomerDto } from './dto/create-customer.dto';
import { type CustomerListResponse, CustomerResponse } from './dto/customer.response';
import { setPasswordMail } from './set-password.mail';

/** A search answers at most this many customers. */
export const CUSTOMER_SEARCH_LIMIT = 50;

@Injectable()
export class CustomersService {
  constructor(
    private readonly em: EntityManager,
    private readonly auth: AuthService,
    private readonly hasher: PasswordHasher,
    private readonly mail: MailService,
  ) {}

  /** Customer accounts whose name or e-mail holds every word of `q` (any case), by name. */
  async search(q: string | undefined): Promise<CustomerListResponse> {
    const conditions: FilterQuery<User>[] = [{ role: 'customer' }];
    for (const word of (q ?? '').split(/\s+/).filter(Boolean)) {
      const pattern = `%${escapeLike(word)}%`;
      conditions.push({ $or: [{ name: { $ilike: pattern } }, { email: { $ilike: pattern } }] });
    }
    const customers = await this.em.find(
      User,
      { $and: conditions },
      { orderBy: { name: 'asc', email: 'asc' }, limit: CUSTOMER_SEARCH_LIMIT },
    );
    return { items: customers.map((user) => CustomerResponse.from(user)) };
  }

  /**
   * Makes a customer account for a walk-in quote. Nobody knows its password (a random one is
   * hashed and forgotten); the customer chooses one from the e-mailed one-time link, which is
   * the password reset token. The account and the token are written together.
   */
  async create(dto: CreateCustomerDto): Promise<CustomerResponse> {
    if ((await this.em.count(User, { email: dto.email })) > 0) throw emailTakenException();
    const unusablePasswordHash = await this.hasher.hash(randomBytes(32).toString('base64url'));
    const customer = new User(dto.email, dto.name, 'customer', unusablePasswordHash);
    let setPasswordUrl: string;
    try {
      setPasswordUrl = await this.em.transactional((em) => {
        em.persist(customer);
        return Promise.resolve(this.auth.addPasswordLinkToken(em, customer, SET_PASSWORD_TTL_MS));
      });
    } catch (error) {
      // Two desks creating one address at once: the unique index decides.
      if (error instanceof UniqueConstraintViolationException) throw emailTakenException();
      throw error;
    }
    this.mail.sendInBackground(
      customer.email,
      setPasswordMail({
        name: customer.name,
        setPasswordUrl,
        validForHours: SET_PASSWORD_TTL_MS / 3_600_000,
      }),
    );
    return CustomerResponse.from(customer);
  }
}
