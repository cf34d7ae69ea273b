import { createServer, type AddressInfo } from 'node:net';
import type { ReceivedMail } from '@channelwright/shared/schemas';
import { MailDeliveryService } from '../../src/mail/mail-delivery.service.js';
import { MailboxService } from '../../src/mail/mailbox.service.js';
import type { TestApp } from './test-app.js';
import { TEST_DATABASE_ENGINE } from './test-database.js';

/**
 * Waits until the outbox has nothing left to attempt now, then returns what the local SMTP sink
 * received for `to` (newest first). The sink stores a message before it answers the DATA command,
 * so once the delivery round is over every delivered message is in the table.
 */
export async function receivedMail(t: TestApp, to: string): Promise<ReceivedMail[]> {
  await t.app.get(MailDeliveryService).idle();
  return t.app.get(MailboxService).received({ exactTo: to, limit: 500 });
}

/** The outbox rows as stored, oldest first (SQLite's createdAt counts whole seconds: ties go by rowid; PostgreSQL's counts microseconds). */
export function outboxRows(t: TestApp): Promise<Array<{ id: string; recipient: string; subject: string; state: string; attempts: number; lastError: string | null }>> {
  const tieBreak = TEST_DATABASE_ENGINE === 'postgres' ? '"id"' : '"rowid"';
  return t.query(`SELECT "id", "recipient", "subject", "state", "attempts", "lastError" FROM "outbox_messages" ORDER BY "createdAt", ${tieBreak}`);
}

/** A port nothing listens on: bound once, then released (for "the mail server cannot be reached"). */
export async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as AddressInfo;
  await new Promise<void>((resolve) => server.close(() => resolve()));
  return port;
}
