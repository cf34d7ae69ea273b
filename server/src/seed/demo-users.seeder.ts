import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { hashPassword } from '../auth/password-hasher.js';
import { UsersService } from '../users/users.service.js';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from './demo-accounts.js';
import type { DemoSeeder } from './demo-seeder.js';

/** The four demo accounts (invented demo data), before any other feature's demo data. */
@Injectable()
export class DemoUsersSeeder implements DemoSeeder {
  readonly order = 0;

  constructor(private readonly users: UsersService) {}

  async seed(manager: EntityManager): Promise<void> {
    // They all share the one published password, so one hash serves (scrypt costs ~0.7 s each).
    const passwordHash = await hashPassword(DEMO_PASSWORD);
    for (const account of Object.values(DEMO_ACCOUNTS)) {
      const { job: _job, role, processMaintainer, libraryAccess, ...fields } = account;
      const user = await this.users.createAccount({ ...fields, passwordHash, emailConfirmed: true }, manager);
      if (user.role !== role || processMaintainer || libraryAccess) await this.users.grant(user.id, { role, processMaintainer, libraryAccess }, manager);
    }
  }
}
