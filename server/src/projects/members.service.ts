import type { AddMemberRequest, ProjectMember, ProjectRole } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource, EntityManager } from 'typeorm';
import { currentActor } from '../audit/audit-actor.js';
import { AuditService } from '../audit/audit.service.js';
import { conflict, DomainError, notFound } from '../common/errors/domain-error.js';
import { runInTransaction } from '../database/run-in-transaction.js';
import { MailService } from '../mail/mail.service.js';
import { memberAddedNotice } from '../mail/notices/member-added-notice.js';
import { UserEntity } from '../users/user.entity.js';
import { ProjectMemberEntity } from './project-member.entity.js';
import { ProjectEntity } from './project.entity.js';
import { toMember } from './project-response.js';

const ROLE_ORDER: Record<ProjectRole, number> = { owner: 0, designer: 1, reviewer: 2, viewer: 3 };

/** Members of a project: add by e-mail, change a role, remove. A project always keeps an owner. Callers check access. */
@Injectable()
export class MembersService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly audit: AuditService,
    private readonly mail: MailService,
  ) {}

  /** By role (owner first), then by name. */
  async list(projectId: string, manager: EntityManager = this.dataSource.manager): Promise<ProjectMember[]> {
    const members = await manager.getRepository(ProjectMemberEntity).find({ where: { projectId }, relations: { user: true } });
    return members
      .toSorted((a, b) => ROLE_ORDER[a.role] - ROLE_ORDER[b.role] || a.user.displayName.localeCompare(b.user.displayName))
      .map(toMember);
  }

  /** 404 USER_NOT_FOUND (field email) for an unknown e-mail, 409 MEMBER_EXISTS when already a member. */
  add(projectId: string, request: AddMemberRequest): Promise<ProjectMember> {
    return runInTransaction(this.dataSource, async (manager) => {
      const user = await manager.getRepository(UserEntity).findOneBy({ email: request.email });
      if (!user || user.disabled) throw new DomainError('USER_NOT_FOUND', `There is no active account with the e-mail ${request.email}`, 404, 'email');
      const members = manager.getRepository(ProjectMemberEntity);
      if (await members.existsBy({ projectId, userId: user.id })) throw conflict('MEMBER_EXISTS', `${request.email} is already a member of this project`, 'email');
      await members.insert({ projectId, userId: user.id, role: request.role });
      const project = await manager.getRepository(ProjectEntity).findOneByOrFail({ id: projectId });
      const actor = currentActor();
      const addedBy = actor ? ((await manager.getRepository(UserEntity).findOneBy({ id: actor.id }))?.displayName ?? null) : null;
      await this.audit.record(manager, { projectId, entityType: 'member', entityId: user.id, action: 'member.added', after: { email: user.email, role: request.role }, summary: `Added ${user.displayName} as ${request.role}` });
      await this.mail.notify(memberAddedNotice(user.email, project.name, projectId, request.role, addedBy), manager);
      return this.one(manager, projectId, user.id);
    });
  }

  /** 409 LAST_OWNER when this would leave the project without an owner. */
  updateRole(projectId: string, userId: string, role: ProjectRole): Promise<ProjectMember> {
    return runInTransaction(this.dataSource, async (manager) => {
      const member = await this.find(manager, projectId, userId);
      if (member.role === 'owner' && role !== 'owner') await this.assertAnotherOwner(manager, projectId);
      if (member.role !== role) {
        await manager.getRepository(ProjectMemberEntity).update({ projectId, userId }, { role });
        await this.audit.record(manager, { projectId, entityType: 'member', entityId: userId, action: 'member.role-changed', before: { role: member.role }, after: { role }, summary: `Changed ${member.user.displayName} from ${member.role} to ${role}` });
      }
      return this.one(manager, projectId, userId);
    });
  }

  /** 409 LAST_OWNER when this is the last owner. */
  remove(projectId: string, userId: string): Promise<void> {
    return runInTransaction(this.dataSource, async (manager) => {
      const member = await this.find(manager, projectId, userId);
      if (member.role === 'owner') await this.assertAnotherOwner(manager, projectId);
      await manager.getRepository(ProjectMemberEntity).delete({ projectId, userId });
      await this.audit.record(manager, { projectId, entityType: 'member', entityId: userId, action: 'member.removed', before: { email: member.user.email, role: member.role }, summary: `Removed ${member.user.displayName} (${member.role})` });
    });
  }

  private async find(manager: EntityManager, projectId: string, userId: string): Promise<ProjectMemberEntity> {
    const member = await manager.getRepository(ProjectMemberEntity).findOne({ where: { projectId, userId }, relations: { user: true } });
    if (!member) throw notFound('MEMBER_NOT_FOUND', 'This user is not a member of this project');
    return member;
  }

  private async one(manager: EntityManager, projectId: string, userId: string): Promise<ProjectMember> {
    return toMember(await this.find(manager, projectId, userId));
  }

  private async assertAnotherOwner(manager: EntityManager, projectId: string): Promise<void> {
    const owners = await manager.getRepository(ProjectMemberEntity).countBy({ projectId, role: 'owner' });
    if (owners <= 1) throw conflict('LAST_OWNER', 'A project keeps at least one owner: make someone else owner first', 'role');
  }
}
