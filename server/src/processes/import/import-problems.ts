import type { Problem } from '@channelwright/shared/schemas';
import { DomainError } from '../../common/errors/domain-error.js';

/** At most this many problems are listed; a file with more gets a last line saying how many were left out. */
export const MAX_LISTED_PROBLEMS = 100;

/** The whole file is refused: 400 IMPORT_INVALID with every problem by row and field; nothing is stored. */
export function importInvalid(problems: Problem[]): DomainError {
  const listed = problems.slice(0, MAX_LISTED_PROBLEMS);
  if (problems.length > MAX_LISTED_PROBLEMS) {
    listed.push({ field: 'file', message: `… and ${problems.length - MAX_LISTED_PROBLEMS} more problems` });
  }
  const count = problems.length === 1 ? 'a problem' : `${problems.length} problems`;
  return new DomainError('IMPORT_INVALID', `The file has ${count}; nothing was stored`, 400, 'file', listed);
}
