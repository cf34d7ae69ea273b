import { Column, CreateDateColumn, Entity, ForeignKey, PrimaryGeneratedColumn } from 'typeorm';
import { COLUMN_TYPES } from '../database/column-types.js';

/**
 * An uploaded curve file, kept as it came (for re-runs and audit) with its SHA-256 and the form fields it was read
 * with; what reading it found (the curves, the sign convention, the notes) beside it. Several extractions (re-runs)
 * share one upload.
 */
@Entity('extraction_uploads')
export class ExtractionUploadEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar', length: 255 })
  fileName: string;

  /** SHA-256 (hex) of the bytes. */
  @Column({ type: 'varchar', length: 64 })
  sha256: string;

  @Column({ type: 'integer' })
  bytes: number;

  @Column({ type: COLUMN_TYPES.bytes })
  content: Buffer;

  /** JSON text of the CurveFileOptions the file is read with (polarity; W, L, fingers, temperature as typed). */
  @Column({ type: 'text' })
  readOptions: string;

  /** JSON text of what reading found: { points, convention, notes, curves }. */
  @Column({ type: 'text' })
  reading: string;

  /** An account (the users module's table, read through UsersService). */
  @Column({ type: 'varchar', nullable: true })
  @ForeignKey('users', { name: 'FK_extraction_uploads_uploadedBy', onDelete: 'SET NULL' })
  uploadedById: string | null;

  @CreateDateColumn({ type: COLUMN_TYPES.timestamp })
  createdAt: Date;
}
