import { formatQuantity } from '@channelwright/shared/units';
import { Paper, Stack, Text } from '@mantine/core';
import type { TooltipContentProps } from 'recharts';

interface ReadoutOptions {
  xSymbol: string;
  xUnit: string;
  yUnit: string;
  /** A sentence under the values, e.g. "Click to take this VOV". */
  hint?: string;
}

/** The hover read-out: x and every series' y at it, in engineering notation with units. */
export function makeReadout({ xSymbol, xUnit, yUnit, hint }: ReadoutOptions) {
  return function ChartReadout({ active, payload, label }: TooltipContentProps) {
    if (!active || !payload?.length || typeof label !== 'number') return null;
    return (
      <Paper withBorder shadow="xs" p={6} radius="sm" style={{ pointerEvents: 'none' }}>
        <Stack gap={2}>
          <Text size="xs" fw={600} ff="monospace">
            {xSymbol} = {formatQuantity(label, xUnit)}
          </Text>
          {payload.map((entry) => (
            <Text key={String(entry.dataKey)} size="xs" ff="monospace" c={entry.color}>
              {entry.name}: {typeof entry.value === 'number' ? formatQuantity(entry.value, yUnit) : '—'}
            </Text>
          ))}
          {hint && (
            <Text size="xs" c="dimmed">
              {hint}
            </Text>
          )}
        </Stack>
      </Paper>
    );
  };
}
