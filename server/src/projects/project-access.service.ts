import type { GlobalRole, ProjectRole } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { UnitOfWork } from '../database/unit-of-work.js';
import { type DomainError, forbidden, notFound } from '../common/errors/domain-error.js';

import { meetsNeed, rolesFor, seesProject, type ProjectNeed } from './project-need.js';
import { ProjectMemberEntity } from './project-member.entity.js';
import { ProjectEntity } from './project.entity.js';

/** Who is asking, in which project, with which role; what ProjectAccessService.require answers. */
export interface ProjectAccess {
  projectId: string;
  userId: string;
  /** The caller's project role; null for an admin who is not a member. */
  role: ProjectRole | null;
  admin: boolean;
}

export interface RequireOptions {
  /** The 404 an outsider gets; PROJECT_NOT_FOUND when absent (a sheet route passes SHEET_NOT_FOUND). */
  notFound?: () => DomainError;
  /** Read inside an open transaction. */
  manager?: EntityManager;
}

export const projectNotFound = (): DomainError => notFound('PROJECT_NOT_FOUND', 'There is no project with this id');

/**
 * The one place project authorization is decided. Outsiders get 404 (the same answer as for a
 * project that does not exist, so nothing is revealed); members whose role is not enough get 403.
 */
@Injectable()
export class ProjectAccessService {
  constructor(private readonly unitOfWork: UnitOfWork) {}

  async require(user: { id: string; role: GlobalRole }, projectId: string, need: ProjectNeed, options: RequireOptions = {}): Promise<ProjectAccess> {
    const manager = options.manager ?? this.unitOfWork.manager;
    const missing = options.notFound ?? projectNotFound;
    const exists = await manager.getRepository(ProjectEntity).existsBy({ id: projectId });
    if (!exists) throw missing();
    const role = await this.roleOf(projectId, user.id, manager);
    if (!seesProject(user.role, role)) throw missing();
    if (!meetsNeed(user.role, role, need)) {
      const roles = rolesFor(need).join(' or ');
      throw forbidden('FORBIDDEN', role === null ? `Only project members who are ${roles} may do this` : `Your role in this project (${role}) may not do this; it takes ${roles}`);
    }
    return { projectId, userId: user.id, role, admin: user.role === 'admin' };
  }

  /** A user's role in a project, or null when not a member. */
  async roleOf(projectId: string, userId: string, manager: EntityManager = this.unitOfWork.manager): Promise<ProjectRole | null> {
    const member = await manager.getRepository(ProjectMemberEntity).findOneBy({ projectId, userId });
    return member?.role ?? null;
  }
}
