import { Group, MultiSelect } from '@mantine/core';
import type { ProcessSpan, SeriesChoice } from '../../model/chart-requests';

interface SeriesPickerProps {
  corners: string[];
  span: ProcessSpan;
  value: SeriesChoice;
  onChange: (choice: SeriesChoice) => void;
}

/** The temperatures a designer usually compares: the process range and tnom. */
export function temperatureChoices(span: ProcessSpan, current: number): number[] {
  const range = span.tempRange ?? { min: -40, max: 125 };
  return [...new Set([range.min, span.tnom, range.max, current])].sort((a, b) => a - b);
}

/** Which corners and temperatures the charts draw, one line (and legend entry) each. */
export function SeriesPicker({ corners, span, value, onChange }: SeriesPickerProps) {
  const temperatures = temperatureChoices(span, value.temperatures[0] ?? span.tnom);
  return (
    <Group gap="xs" align="flex-end">
      <MultiSelect
        label="Corners"
        size="xs"
        w={260}
        data={corners}
        value={value.corners}
        onChange={(next) => next.length > 0 && onChange({ ...value, corners: next })}
      />
      <MultiSelect
        label="Temperatures"
        size="xs"
        w={260}
        data={temperatures.map((t) => ({ value: String(t), label: `${t} °C` }))}
        value={value.temperatures.map(String)}
        onChange={(next) => next.length > 0 && onChange({ ...value, temperatures: next.map(Number) })}
      />
    </Group>
  );
}
