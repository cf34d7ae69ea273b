import type { UserRef } from '@channelwright/shared/schemas';
import type { UserCard } from './users.service.js';

/** The `{ id, displayName }` a response shows for a user; null for none (or an account that is gone). */
export function toUserRef(user: UserCard | null | undefined): UserRef | null {
  return user ? { id: user.id, displayName: user.displayName } : null;
}
