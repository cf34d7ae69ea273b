import { Column, CreateDateColumn, Entity, ForeignKey, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { COLUMN_TYPES } from '../database/column-types.js';

/** A project: the sheets of one chip block and the people who work on them (ProjectMemberEntity). */
@Entity('projects')
export class ProjectEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar', length: 100 })
  name: string;

  @Column({ type: 'text', default: '' })
  description: string;

  /** Optimistic concurrency: raised by every change of name or description. */
  @Column({ type: 'integer', default: 1 })
  version: number;

  /** An account (the users module's table, read through UsersService). */
  @Column({ type: 'varchar', nullable: true })
  @ForeignKey('users', { name: 'FK_projects_createdBy', onDelete: 'SET NULL' })
  createdById: string | null;

  @CreateDateColumn({ type: COLUMN_TYPES.timestamp })
  createdAt: Date;

  @UpdateDateColumn({ type: COLUMN_TYPES.timestamp })
  updatedAt: Date;
}
