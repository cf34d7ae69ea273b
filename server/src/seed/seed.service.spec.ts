import { Injectable, Module } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { DataSource } from 'typeorm';
import { createTestModule, type TestModule } from '../../test/helpers/test-modules.js';
import { UserEntity } from '../users/user.entity.js';
import { DEMO_ACCOUNTS } from './demo-accounts.js';
import { DEMO_SEEDERS, type DemoSeeder } from './demo-seeder.js';
import { SeedModule } from './seed.module.js';
import { SeedService } from './seed.service.js';

const calls: string[] = [];

/** A later feature's seeder, registered in its own module: it needs the demo users to exist already. */
@Injectable()
class NotesDemoSeeder implements DemoSeeder {
  readonly order = 20;
  async seed(manager: EntityManager): Promise<void> {
    const designer = await manager.getRepository(UserEntity).findOneByOrFail({ email: DEMO_ACCOUNTS.designer.email });
    calls.push(`notes for ${designer.email}`);
  }
}
@Module({ providers: [{ provide: DEMO_SEEDERS, useClass: NotesDemoSeeder }] })
class NotesModule {}

@Injectable()
class FailingDemoSeeder implements DemoSeeder {
  readonly order = 10;
  async seed(): Promise<void> {
    calls.push('failing');
    throw new Error('seed data broken');
  }
}
@Module({ providers: [{ provide: DEMO_SEEDERS, useClass: FailingDemoSeeder }] })
class FailingModule {}

describe('SeedService', () => {
  let t: TestModule;
  beforeEach(() => {
    calls.length = 0;
  });
  afterEach(() => t.close());

  it('runs every registered DemoSeeder, the demo users first, other modules after in their order', async () => {
    t = await createTestModule([SeedModule, NotesModule], { SEED_DEMO: 'true' });
    const users = await t.module.get(DataSource).getRepository(UserEntity).find({ order: { email: 'ASC' } });
    expect(users.map((u) => [u.email, u.role, u.processMaintainer])).toEqual([
      [DEMO_ACCOUNTS.admin.email, 'admin', true],
      [DEMO_ACCOUNTS.designer.email, 'member', false],
      [DEMO_ACCOUNTS.reviewer.email, 'member', false],
      [DEMO_ACCOUNTS.viewer.email, 'member', false],
    ]);
    expect(calls).toEqual([`notes for ${DEMO_ACCOUNTS.designer.email}`]);
  });

  it('seeds nothing when the database already has an account', async () => {
    t = await createTestModule([SeedModule, NotesModule], { SEED_DEMO: 'true' });
    calls.length = 0;
    expect(await t.module.get(SeedService).seedIfEmpty()).toBe(false);
    expect(calls).toEqual([]);
    expect(await t.module.get(DataSource).getRepository(UserEntity).count()).toBe(4);
  });

  it('writes all demo data or none: a failing seeder leaves the database empty', async () => {
    t = await createTestModule([SeedModule, NotesModule, FailingModule], { SEED_DEMO: 'false' });
    await expect(t.module.get(SeedService).seedIfEmpty()).rejects.toThrow('seed data broken');
    expect(calls).toEqual(['failing']);
    expect(await t.module.get(DataSource).getRepository(UserEntity).count()).toBe(0);
  });
});
