import type { CreateCommentRequest, RevisionComment } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service.js';
import { DomainError, forbidden } from '../common/errors/domain-error.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import type { ProjectAccess } from '../projects/project-access.service.js';
import { RevisionReader } from '../revisions/revision-reader.js';
import { revisionLabel } from '../revisions/revision-response.js';
import { toUserRef } from '../users/user-ref.js';
import { UsersService, type Account, type UserCard } from '../users/users.service.js';
import { RevisionCommentEntity } from './revision-comment.entity.js';

/** Project roles that may comment on a revision: the people who size and the people who review. */
const COMMENTING_ROLES = ['owner', 'designer', 'reviewer'] as const;

/** Comments on a revision or on one of its devices; they are part of the record and never change. */
@Injectable()
export class CommentsService {
  constructor(
    @InjectRepository(RevisionCommentEntity) private readonly comments: Repository<RevisionCommentEntity>,
    private readonly unitOfWork: UnitOfWork,
    private readonly users: UsersService,
    private readonly revisions: RevisionReader,
    private readonly audit: AuditService,
  ) {}

  async list(revisionId: string): Promise<RevisionComment[]> {
    const rows = await this.comments.find({ where: { revisionId }, order: { createdAt: 'ASC', id: 'ASC' } });
    const authors = await this.users.cards(rows.map((row) => row.authorId));
    return rows.map((row) => toComment(row, authors.get(row.authorId)));
  }

  /** 403 COMMENT_NOT_ALLOWED for viewers (and admins who are not members); 400 DEVICE_NOT_IN_REVISION for a foreign device. */
  async add(revisionId: string, access: ProjectAccess, input: CreateCommentRequest, author: Account): Promise<RevisionComment> {
    if (access.role === null || !(COMMENTING_ROLES as readonly string[]).includes(access.role)) {
      throw forbidden('COMMENT_NOT_ALLOWED', `Only project members who are ${COMMENTING_ROLES.join(', ')} may comment`);
    }
    const id = await this.unitOfWork.run(async (manager) => {
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
    const stored = await this.comments.findOneByOrFail({ id });
    return toComment(stored, { id: author.id, displayName: author.displayName, email: author.email });
  }
}

function toComment(row: RevisionCommentEntity, author: UserCard | undefined): RevisionComment {
  return {
    id: row.id,
    revisionId: row.revisionId,
    device: row.deviceId === null ? null : { id: row.deviceId, name: row.deviceName ?? '' },
    author: toUserRef(author),
    body: row.body,
    createdAt: row.createdAt.toISOString(),
  };
}
