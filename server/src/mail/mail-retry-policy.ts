/** How often and how patiently a delivery is retried. */
export interface MailRetryPolicy {
  /** Attempts in all, the first one included; after the last failure the message is `failed`. */
  maxAttempts: number;
  /** Wait before the second attempt; it doubles for each further one. */
  firstDelayMs: number;
}

export const MAIL_RETRY_POLICY = Symbol('MAIL_RETRY_POLICY');

export const DEFAULT_MAIL_RETRY_POLICY: MailRetryPolicy = { maxAttempts: 5, firstDelayMs: 2000 };

/** The wait after `attempts` failed attempts: firstDelay · 2^(attempts − 1) (exponential backoff). */
export function retryDelayMs(policy: MailRetryPolicy, attempts: number): number {
  return policy.firstDelayMs * 2 ** Math.max(0, attempts - 1);
}
