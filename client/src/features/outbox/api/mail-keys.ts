/** Every query key of the mail pages, from one place. */
export const mailKeys = {
  received: (to: string) => ['mail', 'received', to] as const,
  outbox: (to: string) => ['mail', 'outbox', to] as const,
  mine: ['mail', 'mine'] as const,
};
