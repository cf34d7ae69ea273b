/** The sign-in address that returns to `next` afterwards (home needs no detour). */
export function signInPath(next: string): string {
  return next === '/' || next === '' ? '/sign-in' : `/sign-in?next=${encodeURIComponent(next)}`;
}
