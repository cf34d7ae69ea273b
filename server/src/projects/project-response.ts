import type { Project, ProjectMember, ProjectRole } from '@channelwright/shared/schemas';
import { toUserRef } from '../users/user-ref.js';
import type { UserCard } from '../users/users.service.js';
import type { ProjectMemberEntity } from './project-member.entity.js';
import type { ProjectEntity } from './project.entity.js';

export interface ProjectCounts {
  memberCount: number;
  sheetCount: number;
}

export function toProject(project: ProjectEntity, myRole: ProjectRole | null, counts: ProjectCounts, createdBy: UserCard | undefined): Project {
  return {
    id: project.id,
    name: project.name,
    description: project.description,
    version: project.version,
    myRole,
    createdBy: toUserRef(createdBy),
    memberCount: counts.memberCount,
    sheetCount: counts.sheetCount,
    createdAt: project.createdAt.toISOString(),
    updatedAt: project.updatedAt.toISOString(),
  };
}

/** A member with its account's name and address. */
export function toMember(member: ProjectMemberEntity, user: UserCard): ProjectMember {
  return {
    userId: member.userId,
    email: user.email,
    displayName: user.displayName,
    role: member.role,
    addedAt: member.createdAt.toISOString(),
  };
}
