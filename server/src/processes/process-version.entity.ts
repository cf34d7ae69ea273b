import { Column, CreateDateColumn, Entity, ForeignKey, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { ProcessProfileEntity } from './process-profile.entity.js';
import { COLUMN_TYPES } from '../database/column-types.js';

/**
 * One immutable version of a profile: the full process definition as the shared processSchema
 * validated it, stored as JSON text. Rows are only ever inserted; a trigger refuses updates of its
 * content (see the migration). Sheets and revisions point here (a foreign key to `id`).
 */
@Entity('process_versions')
@Index('IDX_process_versions_profile_number', ['profileId', 'number'], { unique: true })
export class ProcessVersionEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar' })
  profileId: string;

  @ManyToOne(() => ProcessProfileEntity, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'profileId', foreignKeyConstraintName: 'FK_process_versions_profile' })
  profile: Relation<ProcessProfileEntity>;

  /** 1, 2, 3 … per profile. */
  @Column({ type: 'integer' })
  number: number;

  /** Version of the stored definition's layout (PROCESS_FILE_SCHEMA_VERSION when written). */
  @Column({ type: 'integer', default: 1 })
  schemaVersion: number;

  /**
   * The parameter convention the version was written under (PARAMETER_CONVENTION): rows older than engine 2.0
   * hold 1 (the migration's default); every new row is written with the current one.
   */
  @Column({ type: 'integer', default: 1 })
  parameterConvention: number;

  /** JSON text of the Process. */
  @Column({ type: 'text' })
  definition: string;

  @Column({ type: 'varchar', length: 500, default: '' })
  message: string;

  /** The version's SPICE model card as Channelwright re-emitted it from the parsed statements (never the uploaded text); null without one. */
  @Column({ type: 'text', nullable: true })
  modelCard: string | null;

  /** SHA-256 (hex) of modelCard. */
  @Column({ type: 'varchar', length: 64, nullable: true })
  modelCardSha256: string | null;

  /** JSON text of the ModelCardMapping (corners → sections, models → polarity and flavour). */
  @Column({ type: 'text', nullable: true })
  modelCardMapping: string | null;

  /** An account (the users module's table, read through UsersService). */
  @Column({ type: 'varchar', nullable: true })
  @ForeignKey('users', { name: 'FK_process_versions_author', onDelete: 'SET NULL' })
  authorId: string | null;

  @CreateDateColumn({ type: COLUMN_TYPES.timestamp })
  createdAt: Date;
}
