import { type PreparedTable, prepareTableInSteps } from '@channelwright/shared/device';
import { unpackTable } from '../table-storage.js';

/** Bytes a prepared table holds (its columns' buffers, each counted once). */
export function preparedBytes(table: PreparedTable): number {
  const buffers = new Set<ArrayBufferLike>(Object.values(table.columns).map((column) => column.buffer));
  return [...buffers].reduce((sum, buffer) => sum + buffer.byteLength, 0) + table.gmIdPeaks.byteLength;
}

/**
 * Tables ready for lookups, by SHA-256, at most `maxBytes` of them (the least recently used go first; one table larger
 * than the whole cache is still kept, alone). A table is loaded once however many ask for it at the same time: its
 * stored bytes read, checked against the hash, decoded, and prepared in steps with turns of the event loop between
 * them (preparing a full grid in one go holds the loop for a few hundred milliseconds).
 */
export class PreparedTableCache {
  private readonly tables = new Map<string, { table: PreparedTable; bytes: number }>();
  private readonly loading = new Map<string, Promise<PreparedTable>>();
  private used = 0;

  constructor(
    private readonly maxBytes: number,
    private readonly read: (id: string) => Promise<Uint8Array>,
  ) {}

  get(row: { id: string; sha256: string }): Promise<PreparedTable> {
    const known = this.tables.get(row.sha256);
    if (known) {
      // Map order is insertion order: moving it to the end marks it most recently used.
      this.tables.delete(row.sha256);
      this.tables.set(row.sha256, known);
      return Promise.resolve(known.table);
    }
    let pending = this.loading.get(row.sha256);
    if (!pending) {
      pending = this.load(row).finally(() => this.loading.delete(row.sha256));
      this.loading.set(row.sha256, pending);
    }
    return pending;
  }

  /** Tables held now and their bytes (for the bench). */
  get size(): { tables: number; bytes: number } {
    return { tables: this.tables.size, bytes: this.used };
  }

  private async load(row: { id: string; sha256: string }): Promise<PreparedTable> {
    const table = await unpackTable(await this.read(row.id), row.sha256);
    const steps = prepareTableInSteps(table);
    let step = steps.next();
    while (!step.done) {
      await new Promise((resolve) => setImmediate(resolve));
      step = steps.next();
    }
    const prepared = step.value;
    const bytes = preparedBytes(prepared);
    for (const [hash, held] of this.tables) {
      if (this.used + bytes <= this.maxBytes) break;
      this.tables.delete(hash);
      this.used -= held.bytes;
    }
    this.tables.set(row.sha256, { table: prepared, bytes });
    this.used += bytes;
    return prepared;
  }
}
