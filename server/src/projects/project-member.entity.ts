import { PROJECT_ROLES, type ProjectRole } from '@channelwright/shared/schemas';
import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import { UserEntity } from '../users/user.entity.js';
import { ProjectEntity } from './project.entity.js';

/** One person's role in one project. A project always keeps at least one owner. */
@Entity('project_members')
@Index('IDX_project_members_user', ['userId'])
export class ProjectMemberEntity {
  @PrimaryColumn({ type: 'varchar' })
  projectId: string;

  @PrimaryColumn({ type: 'varchar' })
  userId: string;

  @ManyToOne(() => ProjectEntity, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'projectId', foreignKeyConstraintName: 'FK_project_members_project' })
  project: Relation<ProjectEntity>;

  @ManyToOne(() => UserEntity, { nullable: false, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'userId', foreignKeyConstraintName: 'FK_project_members_user' })
  user: Relation<UserEntity>;

  @Column({ type: 'simple-enum', enum: PROJECT_ROLES })
  role: ProjectRole;

  @CreateDateColumn()
  createdAt: Date;
}
