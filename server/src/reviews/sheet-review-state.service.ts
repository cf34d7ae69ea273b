import type { SheetReviewState } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { RevisionReader } from '../revisions/revision-reader.js';
import { toRevisionSummary } from '../revisions/revision-response.js';
import { sheetMatchesRevision } from '../revisions/sheet-matches-revision.js';
import { SheetReader } from '../sheets/sheet-reader.js';
import { ReviewRequestReader } from './review-request-reader.js';
import { toReviewRequest } from './review-request-response.js';

/** Where a sheet stands in review: its latest revision's state, the last sign-off, and the history. */
@Injectable()
export class SheetReviewStateService {
  constructor(
    private readonly sheets: SheetReader,
    private readonly revisions: RevisionReader,
    private readonly requests: ReviewRequestReader,
  ) {}

  async get(sheetId: string): Promise<SheetReviewState> {
    const sheet = await this.sheets.load(sheetId);
    const history = await this.revisions.loadSheet(sheetId);
    const summaries = history.map(toRevisionSummary);
    const latest = history[0];
    const changedSinceLatest = latest ? !sheetMatchesRevision(sheet, latest.revision, await this.revisions.devices(latest.revision.id)) : true;
    const open = history.flatMap((loaded) => loaded.requests.filter((request) => request.state === 'open'));
    const openRequests = [];
    for (const request of open) openRequests.push(toReviewRequest(await this.requests.load(request.id)));
    return {
      sheetId,
      projectId: sheet.sheet.projectId,
      state: summaries[0]?.state ?? 'draft',
      latestRevision: summaries[0] ?? null,
      lastSignedOff: summaries.find((summary) => summary.state === 'signed-off') ?? null,
      changedSinceLatest,
      revisions: summaries,
      openRequests,
    };
  }
}
