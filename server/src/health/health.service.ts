import type { HealthResponse } from '@channelwright/shared/schemas';
import { Injectable, Logger } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import { DomainError } from '../common/errors/domain-error.js';
import { SERVER_VERSION } from '../config/paths.js';

@Injectable()
export class HealthService {
  private readonly logger = new Logger(HealthService.name);

  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  /** Healthy when the database answers a query; otherwise 503 DATABASE_UNAVAILABLE. */
  async check(): Promise<HealthResponse> {
    try {
      await this.dataSource.query('SELECT 1');
    } catch (error) {
      this.logger.error(`Health check: the database did not answer: ${String(error)}`);
      throw new DomainError('DATABASE_UNAVAILABLE', 'The database does not answer', 503);
    }
    return { status: 'ok', version: SERVER_VERSION, db: 'ok' };
  }
}
