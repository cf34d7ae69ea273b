import { MailDeliveryService } from '../../src/mail/mail-delivery.service.js';
import type { TestApp } from './test-app.js';

/** Every row of the tables a change of a revision could touch, for "nothing was written" checks. */
export async function snapshotRows(t: TestApp): Promise<Record<string, unknown[]>> {
  // Mail queued before is delivered in the background (on PostgreSQL beside the request, on a connection of its own):
  // its delivery state is not a write of the request checked.
  await t.app.get(MailDeliveryService).idle();
  const tables = ['revisions', 'revision_devices', 'review_requests', 'revision_comments', 'audit_events', 'outbox_messages'];
  const rows: Record<string, unknown[]> = {};
  for (const table of tables) rows[table] = await t.query(`SELECT * FROM "${table}" ORDER BY "id"`);
  return rows;
}
