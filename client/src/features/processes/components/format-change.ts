const dateTime = new Intl.DateTimeFormat('en-GB', { year: 'numeric', month: 'short', day: 'numeric', hour: '2-digit', minute: '2-digit' });

/** "Brackenfold Admin, 3 Dec 2026, 14:05": who changed something and when. */
export function changedByAndWhen(who: { displayName: string } | null, iso: string): string {
  return `${who?.displayName ?? 'someone'}, ${dateTime.format(new Date(iso))}`;
}
