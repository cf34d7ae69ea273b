/** Where to go after signing in: only a path inside this app, never another site or sign-in again. */
export function safeNextPath(next: string | null): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/sign-')) return '/';
  return next;
}
