/**
 * Every query key of projects, from one place. A project's detail key is the prefix of its members, so
 * refreshing the project refreshes them too; the list is the home page's, with each project's counts.
 */
export const projectKeys = {
  all: ['projects'] as const,
  /** `GET /api/projects`: the caller's projects with their sheet and member counts. */
  list: () => [...projectKeys.all, 'list'] as const,
  /** `GET /api/projects/:id`: a project and the caller's role in it. */
  detail: (projectId: string) => [...projectKeys.all, 'detail', projectId] as const,
  /** `GET /api/projects/:id/members`. */
  members: (projectId: string) => [...projectKeys.detail(projectId), 'members'] as const,
};
