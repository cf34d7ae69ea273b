import { createSecretKey } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { unauthorized } from '../common/errors/domain-error.js';
import { AppConfigService } from '../config/app-config.service.js';
import type { Account } from '../users/users.service.js';
import { UsersService } from '../users/users.service.js';
import type { JwtPayload } from './jwt-payload.js';
import { signingKeyOf } from './signing-key.js';

/**
 * Checks the Bearer token's signature and expiry, then loads its user (UsersService.accountOfRequest, which
 * reuses a read for up to 2 s and forgets it on any change made through the service): a user disabled after
 * the token was issued is refused at once, not when the token expires.
 */
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(
    config: AppConfigService,
    private readonly users: UsersService,
  ) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      // A KeyObject, not the string: given a string, jsonwebtoken tries to read it as a PEM public key on every
      // request and builds the secret key only after that throws (8 % of a compute request's CPU, profiled).
      // Buffer.from(string) is what jsonwebtoken itself would use, so the same tokens verify. passport-jwt hands
      // the key to jsonwebtoken untouched; its types only predate KeyObject.
      secretOrKey: createSecretKey(Buffer.from(signingKeyOf(config))) as unknown as Buffer,
      algorithms: ['HS256'],
      ignoreExpiration: false,
    });
  }

  async validate(payload: JwtPayload): Promise<Account> {
    // jsonwebtoken checks `exp` only when present: a token that never expires is refused here, and so is a
    // token minted for another purpose (an e-mail confirmation link is no access token).
    if (typeof payload.exp !== 'number' || payload.purpose !== undefined) throw unauthorized('UNAUTHENTICATED', 'Sign in to continue');
    const user = typeof payload.sub === 'string' ? await this.users.accountOfRequest(payload.sub) : null;
    if (!user) throw unauthorized('UNAUTHENTICATED', 'This account no longer exists; sign in again');
    if (user.disabled) throw unauthorized('ACCOUNT_DISABLED', 'This account has been disabled by an admin');
    return user;
  }
}
