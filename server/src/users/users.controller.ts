import { updateUserRequestSchema, userSchema, type UpdateUserRequest, type User } from '@channelwright/shared/schemas';
import { Body, Controller, Get, Param, Patch } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { z } from 'zod';
import { Roles } from '../common/auth/roles.decorator.js';
import { ApiZodBody, ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { toUserResponse } from './user-response.js';
import { UsersService } from './users.service.js';

@ApiTags('users')
@ApiBearerAuth()
@Roles('admin')
@Controller('users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  @ApiZodResponse(200, z.array(userSchema), 'Every account, by e-mail (admins only)')
  async list(): Promise<User[]> {
    return (await this.users.list()).map(toUserResponse);
  }

  @Patch(':id')
  @ApiZodBody(updateUserRequestSchema)
  @ApiZodResponse(200, userSchema, 'The updated account (admins only)')
  async update(
    @Param('id') id: string,
    @Body(new ZodValidationPipe(updateUserRequestSchema)) change: UpdateUserRequest,
  ): Promise<User> {
    return toUserResponse(await this.users.update(id, change));
  }
}
