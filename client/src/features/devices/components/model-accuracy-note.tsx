import { MODEL_LABELS, type SizeResponse } from '@channelwright/shared/schemas';
import { Group, Stack, Text } from '@mantine/core';

/** How the figures the tables do not hold are named where a designer reads them. */
const FIGURE_WORDS: Record<string, string> = {
  beta: 'β',
  cdb: 'Cdb',
  csb: 'Csb',
  sigmaVt: 'σ(ΔVT)',
  sigmaVtSingle: 'σ(VT)',
  sigmaBeta: 'σ(Δβ/β)',
  sigmaId: 'σ(ΔID/ID)',
  sigmaVos: 'σ(VOS)',
  ioff: 'Ioff',
  ion: 'Ion',
  ionIoff: 'Ion/Ioff',
  'leakage.gate': 'gate leakage',
  'leakage.junction': 'junction leakage',
  'leakage.subthreshold': 'subthreshold leakage',
  'leakage.idAtZeroVgs': 'ID at VGS = 0',
  'leakage.gidl': 'GIDL',
};

const BASIS_WORDS = { 'long-channel': 'long-channel estimate', fitted: 'fitted to a card', table: 'table' } as const;

/** Which model made the result and how far that model is known to be off; a table result names its table. */
export function ModelAccuracyNote({ result }: { result: SizeResponse }) {
  const { accuracy, table } = result;
  return (
    <Stack gap={2} role="note" aria-label="Model and accuracy">
      <Group gap={6}>
        <Text size="xs" fw={600}>
          {MODEL_LABELS[result.model]}
        </Text>
        {accuracy && (
          <Text size="xs" c="dimmed" aria-label="Accuracy basis">
            basis: {BASIS_WORDS[accuracy.basis]}
          </Text>
        )}
        {table && (
          <Text size="xs" c="dimmed" ff="monospace" title={table.sha256}>
            {table.model} · table {table.sha256.slice(0, 12)}
          </Text>
        )}
      </Group>
      {accuracy && (
        <Text size="xs" c="dimmed">
          {accuracy.summary}
        </Text>
      )}
      {result.analyticFigures && result.analyticFigures.length > 0 && (
        <Text size="xs" c="dimmed">
          Not in the tables, from the all-region model: {result.analyticFigures.map((name) => FIGURE_WORDS[name] ?? name).join(', ')}.
        </Text>
      )}
    </Stack>
  );
}
