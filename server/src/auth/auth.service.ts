import type { AuthResponse, LoginRequest, RegisterRequest } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { forbidden, unauthorized } from '../common/errors/domain-error.js';
import { AppConfigService } from '../config/app-config.service.js';
import { toUserResponse } from '../users/user-response.js';
import type { UserEntity } from '../users/user.entity.js';
import { UsersService } from '../users/users.service.js';
import type { JwtPayload } from './jwt-payload.js';
import { hashPassword, verifyPassword } from './password-hasher.js';

@Injectable()
export class AuthService {
  constructor(
    private readonly users: UsersService,
    private readonly jwt: JwtService,
    private readonly config: AppConfigService,
  ) {}

  /** Sign-up is open when enabled, and always while no account exists (so a fresh server can get its admin). */
  async isSignupOpen(): Promise<boolean> {
    return this.config.signupEnabled || !(await this.users.hasAnyAccount());
  }

  /** Opens an account; the first one ever created becomes admin. */
  async register(request: RegisterRequest): Promise<AuthResponse> {
    if (!(await this.isSignupOpen())) {
      throw forbidden('SIGNUP_DISABLED', 'Sign-up is disabled on this server; ask an admin for an account');
    }
    const user = await this.users.createAccount({
      email: request.email,
      displayName: request.displayName,
      passwordHash: await hashPassword(request.password),
    });
    return this.signedIn(user);
  }

  /** Wrong e-mail and wrong password get the same answer, after the same amount of work. */
  async login(request: LoginRequest): Promise<AuthResponse> {
    const user = await this.users.findByEmail(request.email);
    if (!(await verifyPassword(request.password, user?.passwordHash)) || !user) {
      throw unauthorized('INVALID_CREDENTIALS', 'The e-mail or the password is wrong');
    }
    if (user.disabled) throw unauthorized('ACCOUNT_DISABLED', 'This account has been disabled by an admin');
    return this.signedIn(user);
  }

  private async signedIn(user: UserEntity): Promise<AuthResponse> {
    const payload: JwtPayload = { sub: user.id };
    return { accessToken: await this.jwt.signAsync(payload), user: toUserResponse(user) };
  }
}
