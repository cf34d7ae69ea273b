/** The field of a zod issue as the API names it: its path joined with dots ("sweep.points"), or undefined for the whole body. */
export function fieldOfIssue(issue: { path: readonly PropertyKey[] }): string | undefined {
  return issue.path.length ? issue.path.map(String).join('.') : undefined;
}
