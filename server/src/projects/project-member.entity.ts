import { PROJECT_ROLES, type ProjectRole } from '@channelwright/shared/schemas';
import { Column, CreateDateColumn, Entity, ForeignKey, Index, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { ProjectEntity } from './project.entity.js';
import { COLUMN_TYPES } from '../database/column-types.js';

/** One person's role in one project. A project always keeps at least one owner. */
@Entity('project_members')
@Index('IDX_project_members_user', ['userId'])
export class ProjectMemberEntity {
  @PrimaryColumn({ type: 'varchar' })
  projectId: string;

  /** An account (the users module's table, read through UsersService). */
  @PrimaryColumn({ type: 'varchar' })
  @ForeignKey('users', { name: 'FK_project_members_user', onDelete: 'CASCADE' })
  userId: string;

  @ManyToOne(() => ProjectEntity, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'projectId', foreignKeyConstraintName: 'FK_project_members_project' })
  project: Relation<ProjectEntity>;

  @Column({ type: 'simple-enum', enum: PROJECT_ROLES })
  role: ProjectRole;

  @CreateDateColumn({ type: COLUMN_TYPES.timestamp })
  createdAt: Date;
}
