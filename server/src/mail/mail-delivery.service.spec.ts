import { Test, type TestingModule } from '@nestjs/testing';
import { DataSource } from 'typeorm';
import { closedPort } from '../../test/helpers/mail.js';
import { createTestEnv, type TestEnv } from '../../test/helpers/test-env.js';
import { ConfigModule } from '../config/config.module.js';
import { loadConfig } from '../config/load-config.js';
import { DatabaseModule } from '../database/database.module.js';
import { MailDeliveryService } from './mail-delivery.service.js';
import { MAIL_RETRY_POLICY, retryDelayMs, type MailRetryPolicy } from './mail-retry-policy.js';
import { MailModule } from './mail.module.js';
import { MailService } from './mail.service.js';
import { OutboxMessageEntity } from './outbox-message.entity.js';

const QUICK_POLICY: MailRetryPolicy = { maxAttempts: 3, firstDelayMs: 20 };

describe('retryDelayMs', () => {
  it('doubles the wait after each failed attempt, starting from the first delay', () => {
    expect([1, 2, 3, 4].map((attempts) => retryDelayMs({ maxAttempts: 5, firstDelayMs: 2000 }, attempts))).toEqual([2000, 4000, 8000, 16000]);
  });
});

describe('MailDeliveryService against an SMTP server that cannot be reached', () => {
  let testEnv: TestEnv;
  let module: TestingModule;

  beforeEach(async () => {
    testEnv = await createTestEnv({ SEED_DEMO: 'false', SMTP_URL: `smtp://127.0.0.1:${await closedPort()}` });
    module = await Test.createTestingModule({ imports: [ConfigModule.forRoot(loadConfig(testEnv.env)), DatabaseModule, MailModule] })
      .overrideProvider(MAIL_RETRY_POLICY)
      .useValue(QUICK_POLICY)
      .compile();
    module.useLogger(false);
    await module.init();
  });
  afterEach(async () => {
    await module.close();
    await testEnv.remove();
  });

  it('retries with backoff and, after the last attempt, marks the message failed with the error kept', async () => {
    const stored = await module.get(MailService).send({ to: 'Far.Away@brackenfold.example', subject: 'Decision', text: 't', html: '<p>t</p>', link: 'http://localhost:3000/' });
    const outbox = module.get(DataSource).getRepository(OutboxMessageEntity);
    const delivery = module.get(MailDeliveryService);
    const attemptsSeen = new Set<number>();
    // Waits out each retry the service schedules by itself, until the message is no longer queued.
    for (let round = 0; round < 20; round += 1) {
      await delivery.idle();
      const row = await outbox.findOneByOrFail({ id: stored.id });
      attemptsSeen.add(row.attempts);
      if (row.state !== 'queued') break;
      expect(row.lastError).toMatch(/ECONNREFUSED|connect/i);
      await new Promise((resolve) => setTimeout(resolve, Math.max(0, row.nextAttemptAt.getTime() - Date.now()) + 10));
    }
    const row = await outbox.findOneByOrFail({ id: stored.id });
    expect(row).toMatchObject({ recipient: 'far.away@brackenfold.example', state: 'failed', attempts: QUICK_POLICY.maxAttempts, sentAt: null });
    expect(row.lastError).toMatch(/ECONNREFUSED|connect/i);
    expect([...attemptsSeen].every((n) => n >= 1 && n <= QUICK_POLICY.maxAttempts)).toBe(true);
  });
});
