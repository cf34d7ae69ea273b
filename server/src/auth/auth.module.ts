import { Module } from '@nestjs/common';
import { APP_GUARD } from '@nestjs/core';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { AppConfigService } from '../config/app-config.service.js';
import { MailModule } from '../mail/mail.module.js';
import { UsersModule } from '../users/users.module.js';
import { AuthController } from './auth.controller.js';
import { AuthService } from './auth.service.js';
import { JwtAuthGuard } from './guards/jwt-auth.guard.js';
import { RolesGuard } from './guards/roles.guard.js';
import { JwtStrategy } from './jwt.strategy.js';
import { DEFAULT_SIGN_IN_POLICY, SIGN_IN_POLICY, SignInLimits } from './sign-in-limits.js';
import { signingKeyOf } from './signing-key.js';

/** Sign-up, sign-in and the global guards; tokens are HS256 with an expiry, signed with JWT_SECRET or the key in DATA_DIR. */
@Module({
  imports: [
    UsersModule,
    MailModule,
    PassportModule,
    JwtModule.registerAsync({
      inject: [AppConfigService],
      useFactory: (config: AppConfigService) => ({
        secret: signingKeyOf(config),
        signOptions: { algorithm: 'HS256', expiresIn: config.jwtTtlSeconds },
        verifyOptions: { algorithms: ['HS256'] },
      }),
    }),
  ],
  controllers: [AuthController],
  providers: [
    AuthService,
    JwtStrategy,
    SignInLimits,
    { provide: SIGN_IN_POLICY, useValue: DEFAULT_SIGN_IN_POLICY },
    // Global guards run in this order: who you are, then what your role allows.
    { provide: APP_GUARD, useClass: JwtAuthGuard },
    { provide: APP_GUARD, useClass: RolesGuard },
  ],
  exports: [AuthService],
})
export class AuthModule {}
