import {
  authResponseSchema,
  loginRequestSchema,
  registerRequestSchema,
  userSchema,
  type AuthResponse,
  type LoginRequest,
  type RegisterRequest,
  type User,
} from '@channelwright/shared/schemas';
import { Body, Controller, Get, HttpCode, Post, UseGuards } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ApiZodBody, ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { toUserResponse } from '../users/user-response.js';
import type { UserEntity } from '../users/user.entity.js';
import { AuthService } from './auth.service.js';
import { CurrentUser } from './decorators/current-user.decorator.js';
import { Public } from './decorators/public.decorator.js';
import { LoginThrottlerGuard } from './guards/login-throttler.guard.js';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(private readonly auth: AuthService) {}

  @Public()
  @Post('register')
  @ApiZodBody(registerRequestSchema)
  @ApiZodResponse(201, authResponseSchema, 'The new account, signed in')
  register(@Body(new ZodValidationPipe(registerRequestSchema)) request: RegisterRequest): Promise<AuthResponse> {
    return this.auth.register(request);
  }

  @Public()
  @Post('login')
  @HttpCode(200)
  @UseGuards(LoginThrottlerGuard)
  @ApiZodBody(loginRequestSchema)
  @ApiZodResponse(200, authResponseSchema, 'An access token and the signed-in user')
  login(@Body(new ZodValidationPipe(loginRequestSchema)) request: LoginRequest): Promise<AuthResponse> {
    return this.auth.login(request);
  }

  @Get('me')
  @ApiBearerAuth()
  @ApiZodResponse(200, userSchema, 'The signed-in user')
  me(@CurrentUser() user: UserEntity): User {
    return toUserResponse(user);
  }
}
