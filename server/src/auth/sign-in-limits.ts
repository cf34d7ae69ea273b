import { Inject, Injectable } from '@nestjs/common';
import { RateLimiterMemory, RateLimiterRes } from 'rate-limiter-flexible';
import { RateLimitedError } from '../common/errors/rate-limited-error.js';

/**
 * How hard sign-in and sign-up push back. The per-address limit blocks a client that keeps failing; the
 * per-account spacing only slows: an account under attack from many addresses answers its owner's correct
 * password after a wait of at most `accountMaxDelayMs` (plus the attempts queued before it), never refuses it.
 */
export interface SignInPolicy {
  /** Failed sign-ins per client address within the window; the next attempt answers 429 until it ends. */
  failuresPerAddress: number;
  addressWindowSeconds: number;
  /** Failed sign-ins of one account (from anywhere) before its attempts are spaced out. */
  freeFailuresPerAccount: number;
  /** The spacing after the free failures, doubling with each further one, up to the maximum. */
  accountBaseDelayMs: number;
  accountMaxDelayMs: number;
  accountWindowSeconds: number;
  /** An attempt that would wait longer than this behind the queued ones of its account answers 429. */
  accountMaxQueueMs: number;
  /** Registrations per client address within the window. */
  registrationsPerAddress: number;
  registrationWindowSeconds: number;
}

export const DEFAULT_SIGN_IN_POLICY: SignInPolicy = {
  failuresPerAddress: 10,
  addressWindowSeconds: 15 * 60,
  freeFailuresPerAccount: 5,
  accountBaseDelayMs: 250,
  accountMaxDelayMs: 4000,
  accountWindowSeconds: 15 * 60,
  accountMaxQueueMs: 30_000,
  registrationsPerAddress: 10,
  registrationWindowSeconds: 60 * 60,
};

export const SIGN_IN_POLICY = Symbol('SIGN_IN_POLICY');

/** A sign-in that was let through; report its outcome with `succeeded` or `failed`. */
export interface SignInAttempt {
  address: string;
  account: string;
}

/**
 * Counters of one server process (rate-limiter-flexible's memory store; a shared store such as its
 * PostgreSQL or Redis limiter would count across several processes).
 */
@Injectable()
export class SignInLimits {
  private readonly addresses: RateLimiterMemory;
  private readonly accounts: RateLimiterMemory;
  private readonly registrations: RateLimiterMemory;
  /** When the next spaced attempt of an account may run (epoch ms). */
  private readonly nextSlot = new Map<string, number>();

  constructor(@Inject(SIGN_IN_POLICY) private readonly policy: SignInPolicy) {
    this.addresses = new RateLimiterMemory({ keyPrefix: 'sign-in-address', points: policy.failuresPerAddress, duration: policy.addressWindowSeconds });
    this.accounts = new RateLimiterMemory({ keyPrefix: 'sign-in-account', points: Number.MAX_SAFE_INTEGER, duration: policy.accountWindowSeconds });
    this.registrations = new RateLimiterMemory({ keyPrefix: 'sign-up-address', points: policy.registrationsPerAddress, duration: policy.registrationWindowSeconds });
  }

  /**
   * Lets one sign-in attempt through, or throws 429. The address pays a point up front (so concurrent
   * attempts cannot all slip under the limit) and gets it back on success; the account's attempts past
   * its free failures wait their turn, spaced out.
   */
  async admit(address: string, email: string): Promise<SignInAttempt> {
    const attempt = { address, account: email.trim().toLowerCase() };
    try {
      await this.addresses.consume(attempt.address);
    } catch (rejection) {
      throw refusal(rejection, 'Too many failed sign-ins from your address; try again later');
    }
    const wait = await this.accountWait(attempt.account);
    if (wait > this.policy.accountMaxQueueMs) {
      await this.addresses.reward(attempt.address);
      throw new RateLimitedError('This account is receiving many sign-in attempts; try again in a minute', Math.ceil(wait / 1000));
    }
    if (wait > 0) await new Promise((resolve) => setTimeout(resolve, wait));
    return attempt;
  }

  async succeeded(attempt: SignInAttempt): Promise<void> {
    await this.addresses.reward(attempt.address);
    await this.accounts.delete(attempt.account);
    this.nextSlot.delete(attempt.account);
  }

  async failed(attempt: SignInAttempt): Promise<void> {
    await this.accounts.consume(attempt.account);
  }

  /** One registration from this address, or 429. */
  async admitRegistration(address: string): Promise<void> {
    try {
      await this.registrations.consume(address);
    } catch (rejection) {
      throw refusal(rejection, 'Too many sign-ups from your address; try again later');
    }
  }

  /** How long the account's next attempt waits (and books that slot). */
  private async accountWait(account: string): Promise<number> {
    const failures = (await this.accounts.get(account))?.consumedPoints ?? 0;
    const now = Date.now();
    if (failures < this.policy.freeFailuresPerAccount) return 0;
    const spacing = Math.min(this.policy.accountBaseDelayMs * 2 ** (failures - this.policy.freeFailuresPerAccount), this.policy.accountMaxDelayMs);
    const slot = Math.max(now, this.nextSlot.get(account) ?? now) + spacing;
    if (slot - now <= this.policy.accountMaxQueueMs) this.nextSlot.set(account, slot);
    return slot - now;
  }
}

function refusal(rejection: unknown, message: string): Error {
  if (!(rejection instanceof RateLimiterRes)) return rejection instanceof Error ? rejection : new Error(String(rejection));
  return new RateLimitedError(message, Math.ceil(rejection.msBeforeNext / 1000));
}
