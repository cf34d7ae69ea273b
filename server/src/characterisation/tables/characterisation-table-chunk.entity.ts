import { Column, Entity, ForeignKey, Index, PrimaryColumn } from 'typeorm';
import { COLUMN_TYPES } from '../../database/column-types.js';

/**
 * A slice of a stored table's bytes. better-sqlite3 is synchronous: one 20 MB blob written or read at once holds the
 * event loop for most of a second (measured 0.4–1 s here), so tables go in slices of TABLE_CHUNK_BYTES with turns of
 * the loop between them. Chunks belong to their job (deleted with it) and name their table by id.
 */
@Entity('characterisation_table_chunks')
@Index('IDX_characterisation_table_chunks_job', ['jobId'])
export class CharacterisationTableChunkEntity {
  @PrimaryColumn({ type: 'varchar' })
  tableId: string;

  @PrimaryColumn({ type: 'integer' })
  seq: number;

  /** The characterisation job (this module's table). */
  @Column({ type: 'varchar' })
  @ForeignKey('characterisation_jobs', { name: 'FK_characterisation_table_chunks_job', onDelete: 'CASCADE' })
  jobId: string;

  @Column({ type: COLUMN_TYPES.bytes })
  data: Buffer;
}

/** Bytes per chunk: about 10 ms to write or read each on this machine. */
export const TABLE_CHUNK_BYTES = 256 * 1024;
