import { DataSource } from 'typeorm';
import { createTestModule, type TestModule } from '../../test/helpers/test-modules.js';
import { UserEntity } from '../users/user.entity.js';
import { UsersModule } from '../users/users.module.js';
import { runInTransaction } from './run-in-transaction.js';

const row = (email: string) => ({ email, displayName: email, passwordHash: 'x' });

describe('runInTransaction', () => {
  let t: TestModule;
  let dataSource: DataSource;
  beforeEach(async () => {
    t = await createTestModule([UsersModule]);
    dataSource = t.module.get(DataSource);
  });
  afterEach(() => t.close());

  it('keeps the work of a transaction that runs beside one that fails and is rolled back', async () => {
    let releaseFailing!: () => void;
    const failingMayFinish = new Promise<void>((resolve) => (releaseFailing = resolve));
    const failing = runInTransaction(dataSource, async (manager) => {
      await manager.getRepository(UserEntity).save(row('rolled-back@fenwick.example'));
      await failingMayFinish;
      throw new Error('second step failed');
    });
    const succeeding = runInTransaction(dataSource, async (manager) => {
      await manager.getRepository(UserEntity).save(row('kept@fenwick.example'));
    });
    releaseFailing();
    await expect(failing).rejects.toThrow('second step failed');
    await succeeding;
    const emails = (await dataSource.getRepository(UserEntity).find()).map((u) => u.email);
    expect(emails).toEqual(['kept@fenwick.example']);
  });

  it('returns what the work returns and rolls back every step of failed work', async () => {
    expect(await runInTransaction(dataSource, async () => 42)).toBe(42);
    await expect(
      runInTransaction(dataSource, async (manager) => {
        await manager.getRepository(UserEntity).save(row('one@fenwick.example'));
        await manager.getRepository(UserEntity).save(row('two@fenwick.example'));
        await manager.getRepository(UserEntity).save(row('one@fenwick.example')); // unique index: fails
      }),
    ).rejects.toThrow();
    expect(await dataSource.getRepository(UserEntity).count()).toBe(0);
  });
});
