import { Column, Entity, ForeignKey, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { RevisionEntity } from './revision.entity.js';

/**
 * One device as a revision froze it: the sheet device's targets and stored result (JSON text exactly
 * as the sheet held them). Only ever inserted; triggers refuse UPDATE and DELETE.
 */
@Entity('revision_devices')
@Index('IDX_revision_devices_revision_position', ['revisionId', 'position'], { unique: true })
export class RevisionDeviceEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar' })
  revisionId: string;

  @ManyToOne(() => RevisionEntity, { nullable: false, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'revisionId', foreignKeyConstraintName: 'FK_revision_devices_revision' })
  revision: Relation<RevisionEntity>;

  /** The sheet device's id (not a foreign key: the device may be deleted later; the snapshot stays). */
  @Column({ type: 'varchar' })
  deviceId: string;

  @Column({ type: 'integer' })
  position: number;

  @Column({ type: 'varchar', length: 50 })
  name: string;

  /** JSON text of the DeviceTargets. */
  @Column({ type: 'text' })
  targets: string;

  /** JSON text of the DeviceResult; null when the engine refused the targets. */
  @Column({ type: 'text', nullable: true })
  result: string | null;

  /** JSON text of the DeviceComputeError; null when there is a result. */
  @Column({ type: 'text', nullable: true })
  error: string | null;

  @Column({ type: 'varchar', length: 50 })
  engineVersion: string;

  /** A process version (the processes module's table). */
  @Column({ type: 'varchar' })
  @ForeignKey('process_versions', { name: 'FK_revision_devices_processVersion', onDelete: 'RESTRICT' })
  processVersionId: string;

  /** ISO 8601 text, kept as text so the hashed value is exactly the stored one. */
  @Column({ type: 'varchar', length: 30 })
  computedAt: string;
}
