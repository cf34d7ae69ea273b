import type { MailNotice } from '../mail/compose-mail.js';

/** The facts every review mail names. */
export interface ReviewFacts {
  projectName: string;
  sheetName: string;
  /** "r2" */
  label: string;
  revisionId: string;
}

const revisionPath = (facts: ReviewFacts) => `/revisions/${facts.revisionId}`;
const what = (facts: ReviewFacts) => `${facts.sheetName} ${facts.label} (${facts.projectName})`;

export function reviewRequestedNotice(to: string, by: string, facts: ReviewFacts, note: string): MailNotice {
  return {
    to,
    subject: `Review requested: ${facts.sheetName} ${facts.label}`,
    heading: 'A sizing waits for your review',
    paragraphs: [`${by} asks you to review ${what(facts)}.`, ...(note ? [`Their note: ${note}`] : []), 'Open the revision to read it, comment on the whole or on a device, and approve or request changes.'],
    path: revisionPath(facts),
    linkLabel: 'Open the revision',
  };
}

export function decisionNotice(to: string, by: string, facts: ReviewFacts, approved: boolean, comment: string): MailNotice {
  return {
    to,
    subject: approved ? `Signed off: ${facts.sheetName} ${facts.label}` : `Changes requested: ${facts.sheetName} ${facts.label}`,
    heading: approved ? 'Your revision is signed off' : 'Your revision needs changes',
    paragraphs: [
      approved ? `${by} approved and signed off ${what(facts)}. It can no longer change.` : `${by} asks for changes to ${what(facts)}. Edit the sheet and freeze a new revision for review.`,
      ...(comment ? [`Their comment: ${comment}`] : []),
    ],
    path: revisionPath(facts),
    linkLabel: 'Open the revision',
  };
}

export function withdrawnNotice(to: string, by: string, facts: ReviewFacts): MailNotice {
  return {
    to,
    subject: `Review withdrawn: ${facts.sheetName} ${facts.label}`,
    heading: 'A review request was withdrawn',
    paragraphs: [`${by} withdrew the request to review ${what(facts)}. Nothing is waiting for you there any more.`],
    path: revisionPath(facts),
    linkLabel: 'Open the revision',
  };
}
