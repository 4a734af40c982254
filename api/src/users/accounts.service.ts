import { Injectable } from '@nestjs/common';
import { type UserRow, UsersRepository } from './users.repository.js';

export type { UserRow };

/**
 * The accounts other modules may look up (sign-in, sessions, the person behind a token): the users
 * module's data through its own service, never its repository.
 */
@Injectable()
export class AccountsService {
  constructor(private readonly users: UsersRepository) {}

  findById(id: string): Promise<UserRow | undefined> {
    return this.users.findById(id);
  }

  findByEmail(email: string): Promise<UserRow | undefined> {
    return this.users.findByEmail(email);
  }
}
