import { BF130G, BF180G } from '@channelwright/shared/device';
import { cornerNames, type Process, type ProcessProfile, type ProcessProfileSummary, type ProcessVersionSummary } from '@channelwright/shared/schemas';
import { admin } from '../../../test/fixtures';

// Invented demo data, not any foundry's process: the seeded Brackenfold profiles as the API answers them.

const by = { id: admin.id, displayName: admin.displayName };

export function profileOf(id: string, definition: Process, options: { version?: number; latest?: number; demoData?: boolean; nodeClass?: string } = {}): ProcessProfile {
  const latest = options.latest ?? options.version ?? 1;
  const summary: ProcessProfileSummary = {
    id,
    name: definition.name,
    description: definition.description ?? '',
    nodeClass: options.nodeClass ?? '180 nm',
    deprecated: false,
    demoData: options.demoData ?? true,
    latestVersion: latest,
    vdd: definition.vdd,
    tnom: definition.tnom,
    corners: cornerNames(definition),
    createdAt: '2026-11-02T08:00:00.000Z',
    updatedAt: '2026-11-20T09:30:00.000Z',
    updatedBy: by,
  };
  return { ...summary, version: { ...versionOf(id, options.version ?? latest), definition, modelCard: null } };
}

export function versionOf(profileId: string, number: number, message = `version ${number}`): ProcessVersionSummary {
  return { id: `${profileId}-v${number}`, number, message, author: by, createdAt: `2026-11-${String(number + 1).padStart(2, '0')}T09:00:00.000Z`, modelCardSha256: null };
}

export const bf180 = () => profileOf('p-bf180', structuredClone(BF180G));
export const bf130 = () => profileOf('p-bf130', structuredClone(BF130G), { nodeClass: '130 nm' });

export function summaryOf(profile: ProcessProfile): ProcessProfileSummary {
  const { version: _version, ...summary } = profile;
  return summary;
}
