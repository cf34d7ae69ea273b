import type { ReviewRequestState } from '@channelwright/shared/schemas';
import { revisionStateOf } from './revision-state.js';

const at = (minute: number) => new Date(Date.UTC(2026, 2, 1, 9, minute));
const request = (state: ReviewRequestState, minute = 0) => ({ state, createdAt: at(minute), decidedAt: state === 'open' ? null : at(minute + 1) });

describe('revisionStateOf', () => {
  it('is draft for a revision never sent to review, or whose requests were all withdrawn', () => {
    expect(revisionStateOf([])).toBe('draft');
    expect(revisionStateOf([request('withdrawn'), request('withdrawn', 5)])).toBe('draft');
  });

  it('is in review while a request is open, even after an earlier one was withdrawn', () => {
    expect(revisionStateOf([request('withdrawn'), request('open', 5)])).toBe('in-review');
  });

  it('is changes requested when a reviewer sent it back and nothing is open', () => {
    expect(revisionStateOf([request('changes-requested')])).toBe('changes-requested');
    expect(revisionStateOf([request('changes-requested'), request('withdrawn', 5)])).toBe('changes-requested');
  });

  it('is signed off once any request was approved, whatever else happened', () => {
    expect(revisionStateOf([request('changes-requested'), request('approved', 5)])).toBe('signed-off');
  });
});
