import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, type Relation } from 'typeorm';
import { UserEntity } from '../users/user.entity.js';

/** A named process in the library. Its numbers live in immutable ProcessVersionEntity rows; this row points at the latest. */
@Entity('process_profiles')
export class ProcessProfileEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** As the latest version's definition spells it. */
  @Column({ type: 'varchar', length: 100 })
  name: string;

  /** The name folded to lower case (processNameKey): the unique index makes names unique regardless of case. */
  @Index('IDX_process_profiles_nameKey', { unique: true })
  @Column({ type: 'varchar', length: 100 })
  nameKey: string;

  /** As the latest version's definition has it. */
  @Column({ type: 'text', default: '' })
  description: string;

  @Column({ type: 'varchar', length: 50, default: '' })
  nodeClass: string;

  @Column({ type: 'boolean', default: false })
  deprecated: boolean;

  /** Seeded invented demo data, not any foundry's process. */
  @Column({ type: 'boolean', default: false })
  demoData: boolean;

  @Column({ type: 'integer' })
  latestVersion: number;

  @CreateDateColumn()
  createdAt: Date;

  @UpdateDateColumn()
  updatedAt: Date;

  @Column({ type: 'varchar', nullable: true })
  updatedById: string | null;

  @ManyToOne(() => UserEntity, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'updatedById', foreignKeyConstraintName: 'FK_process_profiles_updatedBy' })
  updatedBy: Relation<UserEntity> | null;
}

/** The key the unique index compares: names differing only in case (or Unicode form) collide. */
export function processNameKey(name: string): string {
  return name.trim().normalize('NFKC').toLowerCase();
}
