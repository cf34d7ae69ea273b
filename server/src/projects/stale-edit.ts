import { conflict, type DomainError } from '../common/errors/domain-error.js';

/** 409 STALE_EDIT when the version the client edited is not the stored one; the caller writes nothing. */
export function assertVersion(what: string, stored: { version: number }, edited: number | undefined): void {
  if (edited !== undefined && edited !== stored.version) throw staleEdit(what, stored.version, edited);
}

export function staleEdit(what: string, stored: number, edited: number): DomainError {
  return conflict('STALE_EDIT', `This ${what} was changed by someone else (version ${stored}, you edited version ${edited}); reload it and apply your change again`, 'version');
}
