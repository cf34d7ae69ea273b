/** Every query key of the mail pages, from one place (they poll, so nothing needs to invalidate them). */
export const mailKeys = {
  all: ['mail'] as const,
  received: (to: string) => [...mailKeys.all, 'received', to] as const,
  outbox: (to: string) => [...mailKeys.all, 'outbox', to] as const,
  mine: () => [...mailKeys.all, 'mine'] as const,
};
