import { PROJECT_ROLES } from '@channelwright/shared/schemas';
import { meetsNeed, seesProject } from './project-need.js';

describe('project needs', () => {
  it('lets every member read, owners and designers edit, owners manage, owners and reviewers review', () => {
    const table = Object.fromEntries(PROJECT_ROLES.map((role) => [role, (['read', 'edit', 'manage', 'review'] as const).filter((need) => meetsNeed('member', role, need))]));
    expect(table).toEqual({
      owner: ['read', 'edit', 'manage', 'review'],
      designer: ['read', 'edit'],
      reviewer: ['read', 'review'],
      viewer: ['read'],
    });
  });

  it('lets an admin who is not a member read and manage, but not edit or review', () => {
    expect((['read', 'edit', 'manage', 'review'] as const).filter((need) => meetsNeed('admin', null, need))).toEqual(['read', 'manage']);
    expect(meetsNeed('admin', 'designer', 'edit')).toBe(true);
  });

  it('hides a project from a non-member who is not an admin', () => {
    expect(seesProject('member', null)).toBe(false);
    expect(meetsNeed('member', null, 'read')).toBe(false);
    expect(seesProject('admin', null)).toBe(true);
    expect(seesProject('member', 'viewer')).toBe(true);
  });
});
