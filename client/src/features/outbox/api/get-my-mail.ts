import { receivedMailSchema, type ReceivedMail } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api-client';
import { mailKeys } from './mail-keys';

const listSchema = z.array(receivedMailSchema);

/** `GET /api/mail/mine`: what the local sink received for the signed-in user's address, newest first. */
export const getMyMail = (signal?: AbortSignal): Promise<ReceivedMail[]> => apiRequest('/mail/mine', { schema: listSchema, signal });

export const myMailQueryOptions = () => queryOptions({ queryKey: mailKeys.mine(), queryFn: ({ signal }) => getMyMail(signal), refetchInterval: 5000 });

export const useMyMail = () => useQuery(myMailQueryOptions());
