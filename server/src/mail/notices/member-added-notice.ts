import type { MailNotice } from '../compose-mail.js';

/** Tells a person they were added to a project, with their role and a link to it. */
export function memberAddedNotice(to: string, projectName: string, projectId: string, role: string, addedBy: string | null): MailNotice {
  return {
    to,
    subject: `You were added to ${projectName}`,
    heading: `Welcome to ${projectName}`,
    paragraphs: [`${addedBy ?? 'An administrator'} added you to the project ${projectName} as ${role}.`],
    path: `/projects/${projectId}`,
    linkLabel: 'Open the project',
  };
}
