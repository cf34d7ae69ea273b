import { MATRIX_FIGURE_INFO, MATRIX_FIGURES, type MatrixFigure, type Polarity } from '@channelwright/shared/schemas';
import { ActionIcon, Button, Group, Select, Stack, Text, TextInput } from '@mantine/core';
import { IconPlus, IconX } from '@tabler/icons-react';
import type { DetailErrors, LimitRow } from '../model/device-form';

interface LimitsFieldsProps {
  limits: LimitRow[];
  polarity: Polarity;
  onChange: (limits: LimitRow[]) => void;
  errors: DetailErrors;
  readOnly?: boolean;
}

const label = (figure: MatrixFigure, polarity: Polarity) => (polarity === 'pmos' ? MATRIX_FIGURE_INFO[figure].pmosLabel : MATRIX_FIGURE_INFO[figure].label);
const unitHint = (figure: MatrixFigure) => ({ '%': '%', 'V/V': '', '1/V': '/V' } as Record<string, string>)[MATRIX_FIGURE_INFO[figure].unit] ?? MATRIX_FIGURE_INFO[figure].unit;

/**
 * The limits the corner matrix colours this device's cells by: for example VDS − VDSsat at least 50 mV, or an
 * ID change within ±20 %. Each a figure with a minimum, a maximum or both.
 */
export function LimitsFields({ limits, polarity, onChange, errors, readOnly }: LimitsFieldsProps) {
  const free = MATRIX_FIGURES.filter((f) => !limits.some((l) => l.figure === f));
  const set = (index: number, change: Partial<LimitRow>) => onChange(limits.map((row, i) => (i === index ? { ...row, ...change } : row)));
  return (
    <Stack gap={4} role="group" aria-label="Corner-matrix limits">
      <Text size="sm" fw={500}>Limits across corners</Text>
      {limits.length === 0 && <Text size="xs" c="dimmed">None: the matrix marks each row&apos;s worst cell by direction only.</Text>}
      {limits.map((row, index) => (
        <Group key={row.figure} gap={4} align="flex-start" wrap="nowrap">
          <Select size="xs" w={130} aria-label="Figure" data={[row.figure, ...free].map((f) => ({ value: f, label: label(f, polarity) }))} value={row.figure} onChange={(v) => v && set(index, { figure: v as MatrixFigure })} allowDeselect={false} disabled={readOnly} />
          <TextInput size="xs" w={88} aria-label={`Minimum of ${label(row.figure, polarity)}`} placeholder={`min ${unitHint(row.figure)}`} value={row.min} onChange={(e) => set(index, { min: e.currentTarget.value })} disabled={readOnly} />
          <TextInput size="xs" w={88} aria-label={`Maximum of ${label(row.figure, polarity)}`} placeholder={`max ${unitHint(row.figure)}`} value={row.max} onChange={(e) => set(index, { max: e.currentTarget.value })} disabled={readOnly} />
          {!readOnly && (
            <ActionIcon variant="subtle" color="gray" size="md" aria-label={`Remove the limit on ${label(row.figure, polarity)}`} onClick={() => onChange(limits.filter((_, i) => i !== index))}>
              <IconX size={14} />
            </ActionIcon>
          )}
        </Group>
      ))}
      {limits.map((_, index) => errors[`limits.${index}`] && <Text key={index} size="xs" c="red">{label(limits[index].figure, polarity)}: {errors[`limits.${index}`]}</Text>)}
      {!readOnly && free.length > 0 && (
        <Button size="compact-xs" variant="subtle" leftSection={<IconPlus size={12} />} onClick={() => onChange([...limits, { figure: free[0], min: '', max: '' }])} w="fit-content">
          Add a limit
        </Button>
      )}
    </Stack>
  );
}
