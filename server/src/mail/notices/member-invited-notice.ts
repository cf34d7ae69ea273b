import type { MailNotice } from '../compose-mail.js';

/**
 * Someone tried to add this address to a project, but it has no active account on the server. The owner
 * was answered exactly as for an address with an account (no account enumeration); this mail tells the
 * person what to do.
 */
export function memberInvitedNotice(to: string, projectName: string, role: string, addedBy: string | null): MailNotice {
  return {
    to,
    subject: `${addedBy ?? 'A project owner'} wants to add you to ${projectName}`,
    heading: `An invitation to ${projectName}`,
    paragraphs: [
      `${addedBy ?? 'A project owner'} wants to add you to the project ${projectName} as ${role}, but this address has no active account on this Channelwright server.`,
      'Sign up with this address if the server allows it, or ask an administrator for an account; then ask to be added again.',
    ],
    path: '/sign-up',
    linkLabel: 'Sign up',
  };
}
