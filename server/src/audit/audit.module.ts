import { Module } from '@nestjs/common';
import { APP_INTERCEPTOR } from '@nestjs/core';
import { TypeOrmModule } from '@nestjs/typeorm';
import { UsersModule } from '../users/users.module.js';
import { AuditActorInterceptor } from './audit-actor.js';
import { AuditEventEntity } from './audit-event.entity.js';
import { AuditService } from './audit.service.js';

/**
 * The append-only audit trail; every feature records through AuditService. Also registers the global
 * interceptor that lets AuditService know the signed-in user of the request (audit-actor.ts).
 */
@Module({
  imports: [TypeOrmModule.forFeature([AuditEventEntity]), UsersModule],
  providers: [AuditService, { provide: APP_INTERCEPTOR, useClass: AuditActorInterceptor }],
  exports: [AuditService],
})
export class AuditModule {}
