import type { Polarity } from '@channelwright/shared/schemas';
import { SegmentedControl, Stack, Text } from '@mantine/core';
import { QuantityInput } from '../../../components/quantity-input';
import { CONSTRAINT_ORDER, QUANTITY_FIELDS, symbolOf } from '../model/quantity-fields';
import type { Constraint, TargetsValues } from '../model/targets';

interface ConstraintFieldProps {
  values: TargetsValues;
  polarity: Polarity;
  error?: string;
  onConstraintChange: (constraint: Constraint) => void;
  onValueChange: (constraint: Constraint, text: string) => void;
}

const HINTS: Record<Constraint, string> = {
  vov: 'Overdrive VGS − VT; negative for weak inversion',
  gmId: 'Transconductance efficiency; below 1/(n·UT)',
  w: 'Given width; the gate voltage follows from ID',
  vgs: 'Given gate voltage; the width follows from ID',
};

/**
 * The second sizing constraint besides ID: one of VOV, gm/ID, W or VGS. Each keeps its own text,
 * so switching back and forth loses nothing; only the chosen one is sent.
 */
export function ConstraintField({ values, polarity, error, onConstraintChange, onValueChange }: ConstraintFieldProps) {
  const constraint = values.constraint;
  return (
    <Stack gap={6}>
      <Text size="sm" fw={500} id="constraint-label">
        Second constraint
      </Text>
      <SegmentedControl
        aria-labelledby="constraint-label"
        size="xs"
        fullWidth
        value={constraint}
        onChange={(value) => onConstraintChange(value as Constraint)}
        data={CONSTRAINT_ORDER.map((c) => ({ value: c, label: symbolOf(c, polarity) }))}
      />
      <QuantityInput
        label={symbolOf(constraint, polarity)}
        unit={QUANTITY_FIELDS[constraint].unit}
        placeholder={QUANTITY_FIELDS[constraint].placeholder}
        value={values[constraint]}
        onChange={(text) => onValueChange(constraint, text)}
        error={error}
        title={HINTS[constraint]}
      />
    </Stack>
  );
}
