import type { AuthResponse, ConfirmEmailRequest, LoginRequest, RegisterRequest, RegisterResponse } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { DomainError, forbidden, unauthorized } from '../common/errors/domain-error.js';
import { AppConfigService } from '../config/app-config.service.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import { MailService } from '../mail/mail.service.js';
import { toUserResponse } from '../users/user-response.js';
import type { Account } from '../users/users.service.js';
import { UsersService } from '../users/users.service.js';
import { alreadyRegisteredNotice, confirmEmailNotice } from './account-notices.js';
import type { JwtPayload } from './jwt-payload.js';
import { hashPassword, verifyPassword } from './password-hasher.js';
import { SignInLimits } from './sign-in-limits.js';

const CONFIRM_PURPOSE = 'confirm-email';
const CONFIRM_TTL_SECONDS = 24 * 3600;

const invalidCredentials = () => unauthorized('INVALID_CREDENTIALS', 'The e-mail or the password is wrong');
const invalidLink = () => new DomainError('VALIDATION_FAILED', 'This confirmation link is invalid or has expired; sign up again to get a new one', 400, 'token');

@Injectable()
export class AuthService {
  constructor(
    private readonly users: UsersService,
    private readonly jwt: JwtService,
    private readonly config: AppConfigService,
    private readonly unitOfWork: UnitOfWork,
    private readonly mail: MailService,
    private readonly limits: SignInLimits,
  ) {}

  /** Sign-up is open when enabled, and always while no account exists (so a fresh server can get its admin). */
  async isSignupOpen(): Promise<boolean> {
    return this.config.signupEnabled || !(await this.users.hasAnyAccount());
  }

  /**
   * The first account ever is created as admin and signed in. Every later registration answers the same
   * `confirmation-sent`, after the same work, whether the address is new or taken: a new (or still
   * unconfirmed) address gets a confirmation link, the owner of a taken one a notice.
   */
  async register(request: RegisterRequest, address: string): Promise<RegisterResponse> {
    await this.limits.admitRegistration(address);
    if (!(await this.isSignupOpen())) throw signupDisabled();
    const passwordHash = await hashPassword(request.password);
    return this.unitOfWork.run(async (manager): Promise<RegisterResponse> => {
      if (!(await this.users.hasAnyAccount(manager))) {
        const founder = await this.users.createAccount({ email: request.email, displayName: request.displayName, passwordHash, emailConfirmed: true }, manager);
        return { status: 'signed-in', ...(await this.signedIn(founder)) };
      }
      if (!this.config.signupEnabled) throw signupDisabled();
      const existing = await this.users.findByEmail(request.email, manager);
      if (existing?.emailConfirmed) {
        await this.mail.notify(alreadyRegisteredNotice(existing.email), manager);
      } else {
        // A still unconfirmed account takes the newest sign-up's name and password: whoever holds the
        // mailbox and that password finishes it, so nobody can claim an address ahead of its owner.
        const user = existing ?? (await this.users.createAccount({ email: request.email, displayName: request.displayName, passwordHash, emailConfirmed: false }, manager));
        if (existing) await this.users.setPassword(existing.id, passwordHash, { displayName: request.displayName }, manager);
        const token = await this.jwt.signAsync({ sub: user.id, purpose: CONFIRM_PURPOSE } satisfies JwtPayload, { expiresIn: CONFIRM_TTL_SECONDS });
        await this.mail.notify(confirmEmailNotice(user.email, request.displayName, token), manager);
      }
      return { status: 'confirmation-sent', email: request.email };
    });
  }

  /** Finishes a sign-up: the link's token and the password chosen at sign-up; signs the account in. */
  async confirm(request: ConfirmEmailRequest, address: string): Promise<AuthResponse> {
    const userId = await this.confirmationSubject(request.token);
    const user = await this.users.findById(userId);
    if (!user) throw invalidLink();
    const attempt = await this.limits.admit(address, user.email);
    const check = await verifyPassword(request.password, user.passwordHash);
    if (!check.valid) {
      await this.limits.failed(attempt);
      throw invalidCredentials();
    }
    await this.limits.succeeded(attempt);
    if (user.disabled) throw accountDisabled();
    if (!user.emailConfirmed) await this.users.confirmEmail(user.id);
    return this.signedIn({ ...user, emailConfirmed: true });
  }

  /**
   * Wrong e-mail, wrong password and an unconfirmed account get the same answer after the same work (one
   * scrypt). Limited per client address and spaced out per account (SignInLimits). A bcrypt hash from
   * before scrypt is replaced on the first successful sign-in.
   */
  async login(request: LoginRequest, address: string): Promise<AuthResponse> {
    const attempt = await this.limits.admit(address, request.email);
    const user = await this.users.findByEmail(request.email);
    const check = await verifyPassword(request.password, user?.passwordHash);
    if (!check.valid || !user || !user.emailConfirmed) {
      await this.limits.failed(attempt);
      throw invalidCredentials();
    }
    await this.limits.succeeded(attempt);
    if (user.disabled) throw accountDisabled();
    if (check.needsRehash) await this.users.setPassword(user.id, await hashPassword(request.password));
    return this.signedIn(user);
  }

  private async confirmationSubject(token: string): Promise<string> {
    try {
      const payload = await this.jwt.verifyAsync<JwtPayload>(token);
      if (payload.purpose !== CONFIRM_PURPOSE || typeof payload.exp !== 'number' || typeof payload.sub !== 'string') throw invalidLink();
      return payload.sub;
    } catch {
      throw invalidLink();
    }
  }

  private async signedIn(user: Account): Promise<AuthResponse> {
    const payload: JwtPayload = { sub: user.id };
    return { accessToken: await this.jwt.signAsync(payload), user: toUserResponse(user) };
  }
}

function signupDisabled(): DomainError {
  return forbidden('SIGNUP_DISABLED', 'Sign-up is disabled on this server; ask an admin for an account');
}

function accountDisabled(): DomainError {
  return unauthorized('ACCOUNT_DISABLED', 'This account has been disabled by an admin');
}
