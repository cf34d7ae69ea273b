import { EngineError } from '@channelwright/shared/device';
import { NotFoundException, PayloadTooLargeException, HttpException } from '@nestjs/common';
import { ThrottlerException } from '@nestjs/throttler';
import { z } from 'zod';
import { DomainError, notFound } from '../errors/domain-error.js';
import { toApiErrorBody } from './api-exception.filter.js';

describe('toApiErrorBody', () => {
  it('keeps a DomainError code, status, field and problems', () => {
    const error = new DomainError('STALE_EDIT', 'Someone saved first', 409, 'version', [{ field: 'version', message: 'old' }]);
    expect(toApiErrorBody(error)).toEqual({
      statusCode: 409,
      code: 'STALE_EDIT',
      message: 'Someone saved first',
      field: 'version',
      problems: [{ field: 'version', message: 'old' }],
    });
    expect(toApiErrorBody(notFound('SHEET_NOT_FOUND', 'No such sheet'))).toEqual({ statusCode: 404, code: 'SHEET_NOT_FOUND', message: 'No such sheet' });
  });

  it('maps an EngineError to 400 with its code and field', () => {
    const error = new EngineError('GM_ID_ABOVE_WEAK_INVERSION_LIMIT', 'gm/ID cannot exceed 1/(n·UT)', 'gmOverId');
    expect(toApiErrorBody(error)).toEqual({
      statusCode: 400,
      code: 'GM_ID_ABOVE_WEAK_INVERSION_LIMIT',
      message: 'gm/ID cannot exceed 1/(n·UT)',
      field: 'gmOverId',
    });
  });

  it('maps a zod error to 400 VALIDATION_FAILED naming the nested field', () => {
    const schema = z.object({ targets: z.object({ id: z.number({ error: 'ID must be a number' }) }) });
    const result = schema.safeParse({ targets: { id: 'lots' } });
    expect(result.success).toBe(false);
    expect(toApiErrorBody(result.error)).toEqual({
      statusCode: 400,
      code: 'VALIDATION_FAILED',
      message: 'ID must be a number',
      field: 'targets.id',
      problems: [{ field: 'targets.id', message: 'ID must be a number' }],
    });
  });

  it('gives Nest and add-on HTTP exceptions stable codes', () => {
    expect(toApiErrorBody(new NotFoundException('Cannot GET /api/x')).code).toBe('ROUTE_NOT_FOUND');
    expect(toApiErrorBody(new PayloadTooLargeException()).code).toBe('PAYLOAD_TOO_LARGE');
    expect(toApiErrorBody(new ThrottlerException()).code).toBe('TOO_MANY_REQUESTS');
    expect(toApiErrorBody(new HttpException('Gone', 410))).toMatchObject({ statusCode: 410, code: 'REQUEST_REFUSED' });
  });

  it('answers anything unexpected with 500 INTERNAL_ERROR and none of its details', () => {
    const error = new Error('SQLITE_CORRUPT at /srv/data/channelwright.sqlite');
    const body = toApiErrorBody(error);
    expect(body).toEqual({ statusCode: 500, code: 'INTERNAL_ERROR', message: expect.any(String) });
    expect(JSON.stringify(body)).not.toContain('SQLITE');
    expect(toApiErrorBody(new HttpException('internal detail', 502)).message).not.toContain('internal detail');
  });
});
