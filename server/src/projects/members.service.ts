import { randomUUID } from 'node:crypto';
import type { AddMemberRequest, ProjectMember, ProjectRole } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { currentActor } from '../audit/audit-actor.js';
import { AuditService } from '../audit/audit.service.js';
import { conflict, notFound } from '../common/errors/domain-error.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import { MailService } from '../mail/mail.service.js';
import { memberAddedNotice } from '../mail/notices/member-added-notice.js';
import { memberInvitedNotice } from '../mail/notices/member-invited-notice.js';
import { UsersService } from '../users/users.service.js';
import { ProjectMemberEntity } from './project-member.entity.js';
import { toMember } from './project-response.js';
import { ProjectEntity } from './project.entity.js';

const ROLE_ORDER: Record<ProjectRole, number> = { owner: 0, designer: 1, reviewer: 2, viewer: 3 };

/** Members of a project: add by e-mail, change a role, remove. A project always keeps an owner. Callers check access. */
@Injectable()
export class MembersService {
  constructor(
    private readonly unitOfWork: UnitOfWork,
    private readonly users: UsersService,
    private readonly audit: AuditService,
    private readonly mail: MailService,
  ) {}

  /** By role (owner first), then by name. */
  async list(projectId: string, manager: EntityManager = this.unitOfWork.manager): Promise<ProjectMember[]> {
    const members = await manager.getRepository(ProjectMemberEntity).find({ where: { projectId } });
    const users = await this.users.cards(members.map((m) => m.userId), manager);
    return members
      .filter((member) => users.has(member.userId))
      .map((member) => toMember(member, users.get(member.userId)!))
      .toSorted((a, b) => ROLE_ORDER[a.role] - ROLE_ORDER[b.role] || a.displayName.localeCompare(b.displayName));
  }

  /**
   * Adds the account of an e-mail address with a role, and mails it. The answer is the same whether the
   * address has an active account or not (no account enumeration): for one without, nothing is stored and
   * the address gets a mail saying how to get an account. Only the member list, which the owner needs,
   * shows who has joined. 409 MEMBER_EXISTS for someone who is a member already.
   */
  add(projectId: string, request: AddMemberRequest): Promise<ProjectMember> {
    return this.unitOfWork.run(async (manager) => {
      const user = await this.users.findByEmail(request.email, manager);
      const project = await manager.getRepository(ProjectEntity).findOneByOrFail({ id: projectId });
      const actor = currentActor();
      const addedBy = actor ? ((await this.users.findById(actor.id, manager))?.displayName ?? null) : null;
      const answer = (userId: string): ProjectMember => ({ userId, email: request.email, displayName: request.email, role: request.role, addedAt: new Date().toISOString() });
      if (!user || user.disabled || !user.emailConfirmed) {
        await this.mail.notify(memberInvitedNotice(request.email, project.name, request.role, addedBy), manager);
        return answer(randomUUID());
      }
      const members = manager.getRepository(ProjectMemberEntity);
      if (await members.existsBy({ projectId, userId: user.id })) throw conflict('MEMBER_EXISTS', `${request.email} is already a member of this project`, 'email');
      await members.insert({ projectId, userId: user.id, role: request.role });
      await this.audit.record(manager, { projectId, entityType: 'member', entityId: user.id, action: 'member.added', after: { email: user.email, role: request.role }, summary: `Added ${user.displayName} as ${request.role}` });
      await this.mail.notify(memberAddedNotice(user.email, project.name, projectId, request.role, addedBy), manager);
      return answer(user.id);
    });
  }

  /** 409 LAST_OWNER when this would leave the project without an owner. */
  updateRole(projectId: string, userId: string, role: ProjectRole): Promise<ProjectMember> {
    return this.unitOfWork.run(async (manager) => {
      const { member, name } = await this.find(manager, projectId, userId);
      if (member.role === 'owner' && role !== 'owner') await this.assertAnotherOwner(manager, projectId);
      if (member.role !== role) {
        await manager.getRepository(ProjectMemberEntity).update({ projectId, userId }, { role });
        await this.audit.record(manager, { projectId, entityType: 'member', entityId: userId, action: 'member.role-changed', before: { role: member.role }, after: { role }, summary: `Changed ${name} from ${member.role} to ${role}` });
      }
      return this.one(manager, projectId, userId);
    });
  }

  /** 409 LAST_OWNER when this is the last owner. */
  remove(projectId: string, userId: string): Promise<void> {
    return this.unitOfWork.run(async (manager) => {
      const { member, name, email } = await this.find(manager, projectId, userId);
      if (member.role === 'owner') await this.assertAnotherOwner(manager, projectId);
      await manager.getRepository(ProjectMemberEntity).delete({ projectId, userId });
      await this.audit.record(manager, { projectId, entityType: 'member', entityId: userId, action: 'member.removed', before: { email, role: member.role }, summary: `Removed ${name} (${member.role})` });
    });
  }

  private async find(manager: EntityManager, projectId: string, userId: string): Promise<{ member: ProjectMemberEntity; name: string; email: string }> {
    const member = await manager.getRepository(ProjectMemberEntity).findOneBy({ projectId, userId });
    const user = member ? await this.users.findById(userId, manager) : null;
    if (!member || !user) throw notFound('MEMBER_NOT_FOUND', 'This user is not a member of this project');
    return { member, name: user.displayName, email: user.email };
  }

  private async one(manager: EntityManager, projectId: string, userId: string): Promise<ProjectMember> {
    const { member } = await this.find(manager, projectId, userId);
    const users = await this.users.cards([userId], manager);
    return toMember(member, users.get(userId)!);
  }

  private async assertAnotherOwner(manager: EntityManager, projectId: string): Promise<void> {
    const owners = await manager.getRepository(ProjectMemberEntity).countBy({ projectId, role: 'owner' });
    if (owners <= 1) throw conflict('LAST_OWNER', 'A project keeps at least one owner: make someone else owner first', 'role');
  }
}
