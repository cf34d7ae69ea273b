import { deriveProcessResponseSchema, type DeriveProcessRequest, type DeriveProcessResponse } from '@channelwright/shared/schemas';
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

/** `POST /api/processes/derive`: Cox, γ, 2φF (and VT0 from a flat-band voltage) from tox and doping. Quiet: the dialog shows refusals. */
export const deriveProcess = (request: DeriveProcessRequest): Promise<DeriveProcessResponse> =>
  apiRequest('/processes/derive', { method: 'POST', body: request, schema: deriveProcessResponseSchema, quiet: true });

export const useDeriveProcess = () => useMutation({ mutationFn: deriveProcess });
