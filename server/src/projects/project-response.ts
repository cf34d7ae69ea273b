import type { Project, ProjectMember, ProjectRole } from '@channelwright/shared/schemas';
import { toUserRef } from '../processes/process-response.js';
import type { ProjectMemberEntity } from './project-member.entity.js';
import type { ProjectEntity } from './project.entity.js';

export interface ProjectCounts {
  memberCount: number;
  sheetCount: number;
}

export function toProject(project: ProjectEntity, myRole: ProjectRole | null, counts: ProjectCounts): Project {
  return {
    id: project.id,
    name: project.name,
    description: project.description,
    version: project.version,
    myRole,
    createdBy: toUserRef(project.createdBy),
    memberCount: counts.memberCount,
    sheetCount: counts.sheetCount,
    createdAt: project.createdAt.toISOString(),
    updatedAt: project.updatedAt.toISOString(),
  };
}

/** A member with its user loaded. */
export function toMember(member: ProjectMemberEntity): ProjectMember {
  return {
    userId: member.userId,
    email: member.user.email,
    displayName: member.user.displayName,
    role: member.role,
    addedAt: member.createdAt.toISOString(),
  };
}
