import type { HealthResponse } from '@channelwright/shared/schemas';
import { Injectable, Logger } from '@nestjs/common';
import { DomainError } from '../common/errors/domain-error.js';
import { SERVER_VERSION } from '../config/paths.js';
import { DatabaseHealth } from '../database/database-health.js';

@Injectable()
export class HealthService {
  private readonly logger = new Logger(HealthService.name);

  constructor(private readonly database: DatabaseHealth) {}

  /** Healthy when the database answers a query; otherwise 503 DATABASE_UNAVAILABLE. */
  async check(): Promise<HealthResponse> {
    try {
      await this.database.ping();
    } catch (error) {
      this.logger.error(`Health check: the database did not answer: ${String(error)}`);
      throw new DomainError('DATABASE_UNAVAILABLE', 'The database does not answer', 503);
    }
    return { status: 'ok', version: SERVER_VERSION, db: 'ok' };
  }
}
