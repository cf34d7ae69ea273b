import { outboxMessageSchema, type OutboxMessage } from '@channelwright/shared/schemas';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api-client';
import { mailKeys } from './mail-keys';

const listSchema = z.array(outboxMessageSchema);

/** `GET /api/admin/mail/outbox?to=` (admins): every message sent or queued, with its delivery state. */
export const getOutbox = (to: string, signal?: AbortSignal): Promise<OutboxMessage[]> =>
  apiRequest(`/admin/mail/outbox${to.trim() ? `?to=${encodeURIComponent(to.trim())}` : ''}`, { schema: listSchema, signal });

export const outboxQueryOptions = (to: string) =>
  queryOptions({ queryKey: mailKeys.outbox(to.trim()), queryFn: ({ signal }) => getOutbox(to, signal), placeholderData: keepPreviousData, refetchInterval: 5000 });

export const useOutbox = (to: string) => useQuery(outboxQueryOptions(to));
