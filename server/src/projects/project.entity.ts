import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, type Relation } from 'typeorm';
import { UserEntity } from '../users/user.entity.js';

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

  @Column({ type: 'varchar', nullable: true })
  createdById: string | null;

  @ManyToOne(() => UserEntity, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'createdById', foreignKeyConstraintName: 'FK_projects_createdBy' })
  createdBy: Relation<UserEntity> | null;

  @CreateDateColumn()
  createdAt: Date;

  @UpdateDateColumn()
  updatedAt: Date;
}
