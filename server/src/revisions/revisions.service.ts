import type { Revision, RevisionDiff, RevisionSummary, RevisionVerification } from '@channelwright/shared/schemas';
import { REVISION_HASH_ALGORITHM } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { AuditService } from '../audit/audit.service.js';
import { badRequest, conflict, notFound } from '../common/errors/domain-error.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import { SheetReader } from '../sheets/sheet-reader.js';
import type { Account } from '../users/users.service.js';
import { deviceContentOf, revisionHash, sheetSnapshotOf } from './revision-content.js';
import { diffRevisions, type DiffSide } from './revision-diff.js';
import { freezeSheet } from './revision-freeze.js';
import { revisionNotFound, RevisionReader } from './revision-reader.js';
import { revisionLabel, toRevision, toRevisionSummary, type LoadedRevision } from './revision-response.js';
import { revisionStateOf } from './revision-state.js';

/** Revisions: freeze a sheet, read, verify the hash, compare. A revision never changes. Callers check access. */
@Injectable()
export class RevisionsService {
  constructor(
    private readonly unitOfWork: UnitOfWork,
    private readonly sheets: SheetReader,
    private readonly reader: RevisionReader,
    private readonly audit: AuditService,
  ) {}

  async freeze(sheetId: string, message: string, author: Account): Promise<Revision> {
    const id = await this.unitOfWork.run(async (manager) => {
      const loaded = await this.sheets.load(sheetId, manager);
      const revision = await freezeSheet(manager, loaded, message, author.id);
      const label = revisionLabel(revision.number);
      await this.audit.record(manager, {
        actor: author,
        projectId: revision.projectId,
        entityType: 'revision',
        entityId: revision.id,
        action: 'revision.created',
        after: { sheetId, number: revision.number, message, hash: revision.hash, deviceCount: loaded.devices.length, processVersion: revision.processVersionNumber, engineVersion: revision.engineVersion },
        summary: `Froze ${loaded.sheet.name} as ${label}: ${message}`,
      });
      return revision.id;
    });
    return this.get(id);
  }

  async list(sheetId: string): Promise<RevisionSummary[]> {
    return (await this.reader.loadSheet(sheetId)).map(toRevisionSummary);
  }

  async get(id: string): Promise<Revision> {
    const loaded = await this.reader.load(id);
    return toRevision(loaded, await this.reader.devices(id));
  }

  /**
   * Recomputes the hash from the stored rows and compares it with the stored one and with the hash each
   * sign-off approved, as its decision holds it and as the audit trail recorded it when it was made.
   */
  async verify(id: string): Promise<RevisionVerification> {
    const loaded = await this.reader.load(id);
    const { revision } = loaded;
    const computedHash = revisionHash(revision, await this.reader.devices(id));
    const approved = loaded.requests.filter((request) => request.state === 'approved');
    const audited = await this.audit.recordedAfter('review.approved', approved.map((request) => request.id));
    const problems: string[] = [];
    if (computedHash !== revision.hash) problems.push('The stored rows no longer hash to the hash stored with the revision.');
    const signatures = approved.map((request) => {
      const auditedHash = auditedSignedHash(audited.find((event) => event.entityId === request.id)?.after);
      const matches = request.signedHash === computedHash && auditedHash === computedHash;
      if (request.signedHash !== computedHash) problems.push(`The stored rows differ from what was signed off (decision ${request.id}).`);
      if (auditedHash !== request.signedHash) problems.push(`The signed hash of decision ${request.id} differs from the one the audit trail recorded when it was signed.`);
      return { reviewRequestId: request.id, signedHash: request.signedHash, auditedHash, matches };
    });
    return { valid: problems.length === 0, algorithm: REVISION_HASH_ALGORITHM, storedHash: revision.hash, computedHash, signatures, problems };
  }

  /** Compares with `againstId`, or with the sheet's latest signed-off revision before this one. */
  async diff(id: string, againstId?: string): Promise<RevisionDiff> {
    const loaded = await this.reader.load(id);
    const against = againstId === undefined ? await this.lastSignedOffBefore(loaded) : await this.loadAgainst(loaded, againstId);
    return diffRevisions(await this.side(loaded), against ? await this.side(against) : null);
  }

  /**
   * Every attempt to change a revision or one of its devices ends here: 404 for a device the revision
   * does not hold, else 409 REVISION_SIGNED_OFF for a signed-off revision and REVISION_IMMUTABLE for
   * any other. Nothing is written either way.
   */
  async refuseChange(id: string, deviceId?: string): Promise<never> {
    const loaded = await this.reader.load(id);
    if (deviceId !== undefined && !(await this.reader.devices(id)).some((device) => device.deviceId === deviceId)) {
      throw notFound('DEVICE_NOT_FOUND', 'This revision holds no device with this id');
    }
    const label = revisionLabel(loaded.revision.number);
    if (revisionStateOf(loaded.requests) === 'signed-off') {
      throw conflict('REVISION_SIGNED_OFF', `${label} is signed off and can never change; edit the sheet and freeze a new revision`);
    }
    throw conflict('REVISION_IMMUTABLE', `${label} is a frozen snapshot and cannot change; edit the sheet and freeze a new revision`);
  }

  private async lastSignedOffBefore(loaded: LoadedRevision): Promise<LoadedRevision | null> {
    const all = await this.reader.loadSheet(loaded.revision.sheetId);
    return all.find((other) => other.revision.number < loaded.revision.number && revisionStateOf(other.requests) === 'signed-off') ?? null;
  }

  private async loadAgainst(loaded: LoadedRevision, againstId: string): Promise<LoadedRevision> {
    const against = await this.reader.load(againstId, undefined, 'against');
    // A revision of another project is as unknown as one that does not exist.
    if (against.revision.projectId !== loaded.revision.projectId) throw revisionNotFound('against');
    if (against.revision.sheetId !== loaded.revision.sheetId) throw badRequest('REVISION_OTHER_SHEET', 'against must be a revision of the same sheet', 'against');
    return against;
  }

  private async side({ revision }: LoadedRevision): Promise<DiffSide> {
    const devices = (await this.reader.devices(revision.id)).map(deviceContentOf);
    return {
      id: revision.id,
      label: revisionLabel(revision.number),
      sheet: { sheet: sheetSnapshotOf(revision), process: { name: revision.processName, version: revision.processVersionNumber }, engineVersion: revision.engineVersion },
      devices,
    };
  }
}

function auditedSignedHash(after: unknown): string | null {
  return typeof after === 'object' && after !== null && 'signedHash' in after && typeof after.signedHash === 'string' ? after.signedHash : null;
}
