import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { hashPassword } from '../auth/password-hasher.js';
import { UserEntity } from '../users/user.entity.js';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from './demo-accounts.js';
import type { DemoSeeder } from './demo-seeder.js';

/** The four demo accounts (invented demo data), before any other feature's demo data. */
@Injectable()
export class DemoUsersSeeder implements DemoSeeder {
  readonly order = 0;

  async seed(manager: EntityManager): Promise<void> {
    // They all share the one published password, so one hash serves (bcrypt costs ~0.25 s each).
    const passwordHash = await hashPassword(DEMO_PASSWORD);
    const users = manager.getRepository(UserEntity);
    for (const account of Object.values(DEMO_ACCOUNTS)) {
      const { job: _job, ...fields } = account;
      await users.save(users.create({ ...fields, passwordHash }));
    }
  }
}
