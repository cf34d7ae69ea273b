import type { CreateCommentRequest, RevisionComment } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import { AuditService } from '../audit/audit.service.js';
import { DomainError, forbidden } from '../common/errors/domain-error.js';
import { runInTransaction } from '../database/run-in-transaction.js';
import { toUserRef } from '../processes/process-response.js';
import type { ProjectAccess } from '../projects/project-access.service.js';
import { RevisionReader } from '../revisions/revision-reader.js';
import { revisionLabel } from '../revisions/revision-response.js';
import type { UserEntity } from '../users/user.entity.js';
import { RevisionCommentEntity } from './revision-comment.entity.js';

/** Project roles that may comment on a revision: the people who size and the people who review. */
const COMMENTING_ROLES = ['owner', 'designer', 'reviewer'] as const;

/** Comments on a revision or on one of its devices; they are part of the record and never change. */
@Injectable()
export class CommentsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly revisions: RevisionReader,
    private readonly audit: AuditService,
  ) {}

  async list(revisionId: string): Promise<RevisionComment[]> {
    const rows = await this.dataSource.getRepository(RevisionCommentEntity).find({ where: { revisionId }, relations: { author: true }, order: { createdAt: 'ASC', id: 'ASC' } });
    return rows.map(toComment);
  }

  /** 403 COMMENT_NOT_ALLOWED for viewers (and admins who are not members); 400 DEVICE_NOT_IN_REVISION for a foreign device. */
  async add(revisionId: string, access: ProjectAccess, input: CreateCommentRequest, author: UserEntity): Promise<RevisionComment> {
    if (access.role === null || !(COMMENTING_ROLES as readonly string[]).includes(access.role)) {
      throw forbidden('COMMENT_NOT_ALLOWED', `Only project members who are ${COMMENTING_ROLES.join(', ')} may comment`);
    }
    const id = await runInTransaction(this.dataSource, async (manager) => {
      const { revision } = await this.revisions.load(revisionId, manager);
      let device: { deviceId: string; name: string } | undefined;
      if (input.deviceId !== undefined) {
        device = (await this.revisions.devices(revisionId, manager)).find((candidate) => candidate.deviceId === input.deviceId);
        if (!device) throw new DomainError('DEVICE_NOT_IN_REVISION', `${revisionLabel(revision.number)} holds no device with this id`, 400, 'deviceId');
      }
      const repository = manager.getRepository(RevisionCommentEntity);
      const comment = await repository.save(
        repository.create({ revisionId, deviceId: device?.deviceId ?? null, deviceName: device?.name ?? null, authorId: author.id, body: input.body, createdAt: new Date() }),
      );
      const on = device ? `${device.name} in ${revisionLabel(revision.number)}` : revisionLabel(revision.number);
      await this.audit.record(manager, {
        actor: author,
        projectId: revision.projectId,
        entityType: 'comment',
        entityId: comment.id,
        action: 'comment.added',
        after: { revisionId, deviceId: comment.deviceId, body: input.body },
        summary: `Commented on ${on}`,
      });
      return comment.id;
    });
    const stored = await this.dataSource.getRepository(RevisionCommentEntity).findOneOrFail({ where: { id }, relations: { author: true } });
    return toComment(stored);
  }
}

function toComment(row: RevisionCommentEntity): RevisionComment {
  return {
    id: row.id,
    revisionId: row.revisionId,
    device: row.deviceId === null ? null : { id: row.deviceId, name: row.deviceName ?? '' },
    author: toUserRef(row.author),
    body: row.body,
    createdAt: row.createdAt.toISOString(),
  };
}
