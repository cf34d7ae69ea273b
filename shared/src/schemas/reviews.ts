import { z } from 'zod';
import { emailSchema } from './auth.js';
import { userRefSchema } from './process-profile.js';
import { revisionStateSchema, revisionSummarySchema } from './revisions.js';

/**
 * Review and sign-off: a designer asks a reviewer (a project member with the reviewer or owner role,
 * never the revision's author) to review a revision; the reviewer comments and decides. Approval
 * signs the revision off; a decision is final for its request; a withdrawn request cannot be decided.
 */

export const REVIEW_REQUEST_STATES = ['open', 'approved', 'changes-requested', 'withdrawn'] as const;
export const reviewRequestStateSchema = z.enum(REVIEW_REQUEST_STATES);
export type ReviewRequestState = z.infer<typeof reviewRequestStateSchema>;

export const REVIEW_DECISIONS = ['approve', 'request-changes'] as const;
export const reviewDecisionSchema = z.enum(REVIEW_DECISIONS, { error: 'decision must be "approve" or "request-changes"' });
export type ReviewDecision = z.infer<typeof reviewDecisionSchema>;

const note = (field: string, max: number) => z.string({ error: `${field} must be text` }).trim().max(max, `${field} must have at most ${max} characters`);

/** Exactly one of reviewerId, reviewerEmail names the reviewer. */
export const createReviewRequestSchema = z
  .strictObject({
    reviewerId: z.string({ error: 'reviewerId must be text' }).trim().min(1, 'reviewerId must not be empty').max(200).optional(),
    reviewerEmail: emailSchema.optional(),
    note: note('note', 2000).default(''),
  })
  .superRefine((value, ctx) => {
    if (value.reviewerId === undefined && value.reviewerEmail === undefined) {
      ctx.addIssue({ code: 'custom', path: ['reviewerId'], message: 'Name the reviewer with reviewerId or reviewerEmail' });
    } else if (value.reviewerId !== undefined && value.reviewerEmail !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['reviewerEmail'], message: 'Give reviewerId or reviewerEmail, not both' });
    }
  });
export type CreateReviewRequest = z.infer<typeof createReviewRequestSchema>;
export type CreateReviewRequestInput = z.input<typeof createReviewRequestSchema>;

export const decideReviewRequestSchema = z.strictObject({
  decision: reviewDecisionSchema,
  comment: note('comment', 5000).default(''),
}).superRefine((value, ctx) => {
  if (value.decision === 'request-changes' && value.comment === '') {
    ctx.addIssue({ code: 'custom', path: ['comment'], message: 'Say what should change: a comment is required with request-changes' });
  }
});
export type DecideReviewRequest = z.infer<typeof decideReviewRequestSchema>;
export type DecideReviewRequestInput = z.input<typeof decideReviewRequestSchema>;

export const INBOX_VIEWS = ['assigned', 'authored'] as const;
export const reviewInboxQuerySchema = z.object({
  mine: z.enum(INBOX_VIEWS, { error: 'mine must be "assigned" or "authored"' }).default('assigned'),
  state: reviewRequestStateSchema.optional(),
});
export type ReviewInboxQuery = z.infer<typeof reviewInboxQuerySchema>;

export const createCommentRequestSchema = z.strictObject({
  body: note('body', 5000).min(1, 'body must not be empty'),
  deviceId: z.string({ error: 'deviceId must be text' }).trim().min(1, 'deviceId must not be empty').max(200).optional().describe("A device of the revision (its id); the whole revision when absent"),
});
export type CreateCommentRequest = z.infer<typeof createCommentRequestSchema>;

export const revisionCommentSchema = z.object({
  id: z.string(),
  revisionId: z.string(),
  device: z.object({ id: z.string(), name: z.string() }).nullable(),
  author: userRefSchema.nullable(),
  body: z.string(),
  createdAt: z.string(),
});
export type RevisionComment = z.infer<typeof revisionCommentSchema>;

export const reviewRequestSchema = z.object({
  id: z.string(),
  projectId: z.string(),
  projectName: z.string(),
  sheetId: z.string(),
  sheetName: z.string(),
  revision: revisionSummarySchema.pick({ id: true, number: true, label: true, message: true, hash: true, state: true }),
  requestedBy: userRefSchema.nullable(),
  reviewer: userRefSchema.extend({ email: z.string() }).nullable(),
  note: z.string(),
  state: reviewRequestStateSchema,
  createdAt: z.string(),
  decidedAt: z.string().nullable().describe('When it was approved, sent back or withdrawn'),
  decisionComment: z.string().nullable(),
  signedHash: z.string().nullable().describe('The revision hash the reviewer approved'),
});
export type ReviewRequest = z.infer<typeof reviewRequestSchema>;

export const reviewRequestListSchema = z.array(reviewRequestSchema);

/** GET /api/sheets/:id/review-state: where the sheet stands and its history of revisions. */
export const sheetReviewStateSchema = z.object({
  sheetId: z.string(),
  projectId: z.string(),
  state: revisionStateSchema.describe("The latest revision's state; draft when the sheet has none"),
  latestRevision: revisionSummarySchema.nullable(),
  lastSignedOff: revisionSummarySchema.nullable(),
  changedSinceLatest: z.boolean().describe('The sheet differs from its latest revision (or has none)'),
  revisions: z.array(revisionSummarySchema).describe('Newest first'),
  openRequests: z.array(reviewRequestSchema),
});
export type SheetReviewState = z.infer<typeof sheetReviewStateSchema>;
