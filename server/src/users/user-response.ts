import type { User } from '@channelwright/shared/schemas';
import type { UserEntity } from './user.entity.js';

/** A user as the API shows it: the shared `userSchema` shape, never the password hash. */
export function toUserResponse(user: UserEntity): User {
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    role: user.role,
    disabled: user.disabled,
    processMaintainer: user.processMaintainer,
    libraryAccess: user.libraryAccess,
    createdAt: user.createdAt.toISOString(),
  };
}
