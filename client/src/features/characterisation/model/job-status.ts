import type { CharacterisationStatus } from '@channelwright/shared/schemas';

/** A job that is still to finish: its progress is worth reading again. */
export const isUnderway = (status: CharacterisationStatus): boolean => status === 'queued' || status === 'running';

export const STATUS_WORDS: Record<CharacterisationStatus, string> = {
  queued: 'waiting to start',
  running: 'simulating',
  done: 'done',
  failed: 'failed',
  cancelled: 'cancelled',
};

export const STATUS_COLORS: Record<CharacterisationStatus, string> = {
  queued: 'gray',
  running: 'channel',
  done: 'teal',
  failed: 'red',
  cancelled: 'gray',
};

/** "about 40 s", "about 3 min"; null when the server cannot tell yet. */
export function etaWords(seconds: number | null): string | null {
  if (seconds === null || !Number.isFinite(seconds)) return null;
  if (seconds < 1) return 'under a second to go';
  if (seconds < 90) return `about ${Math.round(seconds)} s to go`;
  return `about ${Math.round(seconds / 60)} min to go`;
}

/** Whole percent of the points simulated, 0 before the total is known. */
export const percentDone = (progress: { done: number; total: number }): number => (progress.total > 0 ? Math.floor((100 * progress.done) / progress.total) : 0);
