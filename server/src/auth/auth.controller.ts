import {
  authResponseSchema,
  confirmEmailRequestSchema,
  loginRequestSchema,
  registerRequestSchema,
  registerResponseSchema,
  userSchema,
  type AuthResponse,
  type ConfirmEmailRequest,
  type LoginRequest,
  type RegisterRequest,
  type RegisterResponse,
  type User,
} from '@channelwright/shared/schemas';
import { Body, Controller, Get, HttpCode, Ip, Post, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { ApiZodBody, ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { toUserResponse } from '../users/user-response.js';
import type { Account } from '../users/users.service.js';
import { AuthService } from './auth.service.js';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { Public } from '../common/auth/public.decorator.js';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(private readonly auth: AuthService) {}

  @Public()
  @Post('register')
  @ApiZodBody(registerRequestSchema)
  @ApiZodResponse(201, registerResponseSchema, 'The first account of a server, signed in (status signed-in)')
  @ApiZodResponse(202, registerResponseSchema, 'Every later sign-up, new address or taken alike (status confirmation-sent): the link is in the mail; 429 past 10 sign-ups an hour from one address')
  async register(
    @Body(new ZodValidationPipe(registerRequestSchema)) request: RegisterRequest,
    @Ip() address: string,
    @Res({ passthrough: true }) response: Response,
  ): Promise<RegisterResponse> {
    const answer = await this.auth.register(request, address);
    response.status(answer.status === 'signed-in' ? 201 : 202);
    return answer;
  }

  @Public()
  @Post('confirm')
  @HttpCode(200)
  @ApiZodBody(confirmEmailRequestSchema)
  @ApiZodResponse(200, authResponseSchema, 'The confirmed account, signed in; 400 (field token) for a bad or expired link, 401 for a wrong password')
  confirm(@Body(new ZodValidationPipe(confirmEmailRequestSchema)) request: ConfirmEmailRequest, @Ip() address: string): Promise<AuthResponse> {
    return this.auth.confirm(request, address);
  }

  @Public()
  @Post('login')
  @HttpCode(200)
  @ApiZodBody(loginRequestSchema)
  @ApiZodResponse(200, authResponseSchema, 'An access token and the signed-in user; 429 after 10 failures from one address in 15 minutes')
  login(@Body(new ZodValidationPipe(loginRequestSchema)) request: LoginRequest, @Ip() address: string): Promise<AuthResponse> {
    return this.auth.login(request, address);
  }

  @Get('me')
  @ApiBearerAuth()
  @ApiZodResponse(200, userSchema, 'The signed-in user')
  me(@CurrentUser() user: Account): User {
    return toUserResponse(user);
  }
}
