import { listMailQuerySchema, receivedMailSchema, type ListMailQuery, type ReceivedMail } from '@channelwright/shared/schemas';
import { Controller, Get, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { z } from 'zod';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import type { Account } from '../users/users.service.js';
import { MailboxService } from './mailbox.service.js';

/**
 * "My mail": the messages the local sink received for the signed-in user's own address, so that
 * without a real mail server everyone can still read the notices sent to them. Empty when SMTP_URL is set.
 */
@ApiTags('mail')
@ApiBearerAuth()
@Controller('mail')
export class MyMailController {
  constructor(private readonly mailbox: MailboxService) {}

  @Get('mine')
  @ApiZodResponse(200, z.array(receivedMailSchema), "Messages the local sink received for the signed-in user's address, newest first")
  mine(@CurrentUser() user: Account, @Query(new ZodValidationPipe(listMailQuerySchema.pick({ limit: true }))) query: Pick<ListMailQuery, 'limit'>): Promise<ReceivedMail[]> {
    return this.mailbox.received({ limit: query.limit, exactTo: user.email });
  }
}
