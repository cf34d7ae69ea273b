import { Injectable } from '@nestjs/common';
import { ThrottlerGuard } from '@nestjs/throttler';

/**
 * Counts sign-in attempts per e-mail address (lower-cased, as accounts are stored), not per client,
 * so guessing one account's password is slowed wherever the guesses come from.
 */
@Injectable()
export class LoginThrottlerGuard extends ThrottlerGuard {
  protected override async getTracker(request: { body?: { email?: unknown }; ip?: string }): Promise<string> {
    const email: unknown = request.body?.email;
    if (typeof email === 'string' && email.trim() !== '') return `email:${email.trim().toLowerCase()}`;
    return `ip:${request.ip}`;
  }
}
