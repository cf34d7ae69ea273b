import { receivedMailSchema, type ReceivedMail } from '@channelwright/shared/schemas';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api-client';
import { mailKeys } from './mail-keys';

const listSchema = z.array(receivedMailSchema);

/** `GET /api/admin/mail?to=` (admins): what the local SMTP sink received, newest first. */
export const getReceivedMail = (to: string, signal?: AbortSignal): Promise<ReceivedMail[]> =>
  apiRequest(`/admin/mail${to.trim() ? `?to=${encodeURIComponent(to.trim())}` : ''}`, { schema: listSchema, signal });

export const receivedMailQueryOptions = (to: string) =>
  queryOptions({ queryKey: mailKeys.received(to.trim()), queryFn: ({ signal }) => getReceivedMail(to, signal), placeholderData: keepPreviousData, refetchInterval: 5000 });

export const useReceivedMail = (to: string) => useQuery(receivedMailQueryOptions(to));
