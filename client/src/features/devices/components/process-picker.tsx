import type { ProcessProfileSummary } from '@channelwright/shared/schemas';
import { Select, Stack } from '@mantine/core';
import { ProcessSummaryLine } from '../../../components/process-summary-line';

interface ProcessPickerProps {
  profiles: ProcessProfileSummary[];
  value: string | null;
  /** The chosen profile's version when it is not the latest (a link opened the page at an older one). */
  version?: number;
  onChange: (profileId: string) => void;
}

/** Chooses the process profile to size in (its latest version unless told); invented demo profiles say so. */
export function ProcessPicker({ profiles, value, version, onChange }: ProcessPickerProps) {
  const chosen = profiles.find((p) => p.id === value);
  return (
    <Stack gap={4}>
      <Select
        label="Process"
        size="xs"
        data={profiles.map((p) => ({ value: p.id, label: `${p.name} · v${p.id === value && version ? version : p.latestVersion}` }))}
        value={value}
        onChange={(id) => id && onChange(id)}
        allowDeselect={false}
      />
      {chosen && <ProcessSummaryLine profile={chosen} />}
    </Stack>
  );
}
