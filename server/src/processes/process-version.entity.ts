import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { UserEntity } from '../users/user.entity.js';
import { ProcessProfileEntity } from './process-profile.entity.js';

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

  /** JSON text of the Process. */
  @Column({ type: 'text' })
  definition: string;

  @Column({ type: 'varchar', length: 500, default: '' })
  message: string;

  @Column({ type: 'varchar', nullable: true })
  authorId: string | null;

  @ManyToOne(() => UserEntity, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'authorId', foreignKeyConstraintName: 'FK_process_versions_author' })
  author: Relation<UserEntity> | null;

  @CreateDateColumn()
  createdAt: Date;
}
