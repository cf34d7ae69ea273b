import { Column, CreateDateColumn, Entity, ForeignKey, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { CharacterisationJobEntity } from '../jobs/characterisation-job.entity.js';
import { COLUMN_TYPES } from '../../database/column-types.js';

/**
 * One lookup table of a device (polarity and flavour) of a process version: the SHA-256 of the encoded table and its
 * grid; its bytes (byte-shuffled and gzip-compressed) are in CharacterisationTableChunkEntity rows, written before this
 * row, so a table row always has all of them. Only the tables of finished jobs are used; a failed or cancelled job's
 * tables and chunks are deleted with its end.
 */
@Entity('characterisation_tables')
@Index('IDX_characterisation_tables_job_device', ['jobId', 'polarity', 'flavour'], { unique: true })
@Index('IDX_characterisation_tables_version_device', ['processVersionId', 'polarity', 'flavour'])
export class CharacterisationTableEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar' })
  jobId: string;

  @ManyToOne(() => CharacterisationJobEntity, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'jobId', foreignKeyConstraintName: 'FK_characterisation_tables_job' })
  job: Relation<CharacterisationJobEntity>;

  /** A process version (the processes module's table). */
  @Column({ type: 'varchar' })
  @ForeignKey('process_versions', { name: 'FK_characterisation_tables_processVersion', onDelete: 'CASCADE' })
  processVersionId: string;

  @Column({ type: 'varchar', length: 4 })
  polarity: 'nmos' | 'pmos';

  /** '' for the plain NMOS or PMOS. */
  @Column({ type: 'varchar', length: 50, default: '' })
  flavour: string;

  @Column({ type: 'varchar', length: 100 })
  modelName: string;

  @Column({ type: 'varchar', length: 64 })
  sha256: string;

  @Column({ type: 'integer' })
  points: number;

  /** Bytes of the encoded table. */
  @Column({ type: 'integer' })
  size: number;

  /** Bytes stored in `data`. */
  @Column({ type: 'integer' })
  storedBytes: number;

  /** JSON text of the TableGrid. */
  @Column({ type: 'text' })
  grid: string;

  @CreateDateColumn({ type: COLUMN_TYPES.timestamp })
  createdAt: Date;
}
