import { formatDateTime } from '../../../lib/format-date';

/** "Brackenfold Admin, 3 Dec 2026, 14:05": who changed something and when. */
export function changedByAndWhen(who: { displayName: string } | null, iso: string): string {
  return `${who?.displayName ?? 'someone'}, ${formatDateTime(iso)}`;
}
