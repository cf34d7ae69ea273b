import type { Process } from '@channelwright/shared/schemas';
import type { StoredCard } from './model-card/stored-card.js';

/** What a stored process version holds: the parts of a resolved process that never change once committed. */
export interface VersionContent {
  version: number;
  versionId: string;
  definition: Process;
  card: StoredCard | null;
}

const LIMIT = 64;

/**
 * Committed process versions, parsed, by profile and number. A version never changes once written (a
 * database trigger refuses UPDATE), so a parsed copy stays right for as long as the profile exists; the
 * caller still reads the profile row on every request (name, deprecation, deletion, who may see it).
 * Saves reading and parsing the definition, and the model card of up to 2 MB, on every compute request.
 * Content is frozen: code that tried to change a shared definition would throw rather than corrupt others.
 */
export class CommittedVersions {
  private readonly entries = new Map<string, VersionContent>();
  /** Version id → the key of its entry (a sheet names its version by id). */
  private readonly byVersionId = new Map<string, { profileId: string; key: string }>();

  /** The content of a version by its id, with its profile's id; undefined when not kept. */
  getById(versionId: string): { profileId: string; content: VersionContent } | undefined {
    const entry = this.byVersionId.get(versionId);
    if (!entry) return undefined;
    const content = this.entries.get(entry.key);
    if (!content) {
      this.byVersionId.delete(versionId);
      return undefined;
    }
    return { profileId: entry.profileId, content };
  }

  get(profileId: string, number: number): VersionContent | undefined {
    const key = keyOf(profileId, number);
    const found = this.entries.get(key);
    if (found) {
      this.entries.delete(key); // most recently used last
      this.entries.set(key, found);
    }
    return found;
  }

  keep(profileId: string, number: number, content: VersionContent): void {
    if (this.entries.size >= LIMIT) {
      const oldest = this.entries.keys().next().value as string;
      const evicted = this.entries.get(oldest);
      this.entries.delete(oldest);
      if (evicted) this.byVersionId.delete(evicted.versionId);
    }
    this.byVersionId.set(content.versionId, { profileId, key: keyOf(profileId, number) });
    this.entries.set(keyOf(profileId, number), deepFreeze({ version: content.version, versionId: content.versionId, definition: content.definition, card: content.card }));
  }
}

const keyOf = (profileId: string, number: number) => `${profileId}#${number}`;

function deepFreeze<T>(value: T): T {
  if (value !== null && typeof value === 'object' && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const member of Object.values(value)) deepFreeze(member);
  }
  return value;
}
