import { Injectable } from '@nestjs/common';
import { PassportSerializer } from '@nestjs/passport';
import { User } from '../users/entities/user.entity';
import { UsersService } from '../users/users.service';

type Done<T> = (error: unknown, result?: T | false) => void;

/** Only the user's id goes into the session; the user is loaded again on every request. */
@Injectable()
export class SessionSerializer extends PassportSerializer {
  constructor(private readonly users: UsersService) {
    super();
  }

  serializeUser(user: User, done: Done<string>): void {
    done(null, user.id);
  }

  deserializeUser(userId: string, done: Done<User>): void {
    this.users.findActiveById(userId).then(
      // An account that was switched off or removed ends its sessions at the next request.
      (user) => done(null, user ?? false),
      (error: unknown) => done(error),
    );
  }
}
