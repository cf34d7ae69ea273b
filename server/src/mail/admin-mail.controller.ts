import {
  listMailQuerySchema,
  listOutboxQuerySchema,
  outboxMessageSchema,
  receivedMailSchema,
  type ListMailQuery,
  type ListOutboxQuery,
  type OutboxMessage,
  type ReceivedMail,
} from '@channelwright/shared/schemas';
import { Controller, Get, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { z } from 'zod';
import { Roles } from '../common/auth/roles.decorator.js';
import { ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { MailboxService } from './mailbox.service.js';

/** The admins' view of mail: what the local sink received, and the outbox with delivery states. */
@ApiTags('mail')
@ApiBearerAuth()
@Roles('admin')
@Controller('admin/mail')
export class AdminMailController {
  constructor(private readonly mailbox: MailboxService) {}

  @Get()
  @ApiZodResponse(200, z.array(receivedMailSchema), 'Messages the local SMTP sink received, newest first (admins only)')
  received(@Query(new ZodValidationPipe(listMailQuerySchema)) query: ListMailQuery): Promise<ReceivedMail[]> {
    return this.mailbox.received(query);
  }

  @Get('outbox')
  @ApiZodResponse(200, z.array(outboxMessageSchema), 'Every message the server sent or means to send, with its delivery state (admins only)')
  outbox(@Query(new ZodValidationPipe(listOutboxQuerySchema)) query: ListOutboxQuery): Promise<OutboxMessage[]> {
    return this.mailbox.outbox(query);
  }
}
