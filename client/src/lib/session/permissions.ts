import type { User } from '@channelwright/shared/schemas';

/** Who may see what in the client. The server enforces the same rules; hiding is a courtesy. */
export type Permission = (user: User) => boolean;

export const isAdmin: Permission = (user) => user.role === 'admin';

export const canMaintainProcesses: Permission = (user) => user.role === 'admin' || user.processMaintainer;
