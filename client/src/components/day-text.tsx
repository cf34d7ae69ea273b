import { Text } from '@mantine/core';
import { formatDay } from '../lib/format-date';

/** The day of an ISO 8601 time, dimmed, as lists show when something last changed ("3 Mar 2025"). */
export function DayText({ iso }: { iso: string }) {
  return (
    <Text size="xs" c="dimmed" style={{ whiteSpace: 'nowrap' }}>
      {formatDay(iso)}
    </Text>
  );
}
