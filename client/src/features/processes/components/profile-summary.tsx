import { parameterInfo, type ProcessProfile } from '@channelwright/shared/schemas';
import { SimpleGrid, Stack, Text } from '@mantine/core';
import { displayQuantity } from '../utils/display-quantity';
import { changedByAndWhen } from './format-change';

const info = (name: string) => parameterInfo(name)!;

function Fact({ label, value }: { label: string; value: string }) {
  return (
    <Stack gap={0}>
      <Text size="xs" c="dimmed" tt="uppercase" fw={600} lts={0.4}>
        {label}
      </Text>
      <Text size="sm">{value}</Text>
    </Stack>
  );
}

/** The process-level facts of the version shown. */
export function ProfileSummary({ profile }: { profile: ProcessProfile }) {
  const { definition } = profile.version;
  const range = definition.tempRange
    ? `${displayQuantity(definition.tempRange.min, info('tempRange.min'))} … ${displayQuantity(definition.tempRange.max, info('tempRange.max'))}`
    : '—';
  return (
    <SimpleGrid cols={{ base: 2, sm: 3, lg: 6 }}>
      <Fact label="Node class" value={profile.nodeClass || '—'} />
      <Fact label="VDD" value={displayQuantity(definition.vdd, info('vdd'))} />
      <Fact label="Nominal temperature" value={displayQuantity(definition.tnom, info('tnom'))} />
      <Fact label="Temperature of use" value={range} />
      <Fact label="Version" value={`v${profile.version.number} of ${profile.latestVersion}`} />
      <Fact label="This version by" value={changedByAndWhen(profile.version.author, profile.version.createdAt)} />
    </SimpleGrid>
  );
}
