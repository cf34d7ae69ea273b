import { MODEL_LABELS, type Polarity } from '@channelwright/shared/schemas';
import { Fieldset, Group, Select, SegmentedControl, SimpleGrid, Stack, Text } from '@mantine/core';
import { QuantityInput } from '../../../components/quantity-input';
import { QUANTITY_FIELDS, symbolOf } from '../model/quantity-fields';
import type { FieldErrors, TargetDefaults } from '../model/size-request';
import type { QuantityField, TargetsValues } from '../model/targets';
import { ConstraintField } from './constraint-field';

/** What the form needs to know about the process it sizes in. */
export interface ProcessChoices {
  corners: string[];
  /** Flavours per polarity, e.g. { nmos: ['native'], pmos: [] }. */
  flavours: Record<Polarity, string[]>;
  tnom: number;
  vdd: number;
  /** The version has tables characterised from its model card: the table model may be chosen. */
  tableModel?: boolean;
}

interface TargetsFormProps {
  values: TargetsValues;
  onChange: <K extends keyof TargetsValues>(field: K, value: TargetsValues[K]) => void;
  process: ProcessChoices;
  errors: FieldErrors;
  /** A sheet's defaults: an empty corner or temperature follows them. */
  defaults?: TargetDefaults;
  /** Viewers and reviewers see the targets without being able to change them. */
  readOnly?: boolean;
}

const POLARITIES = [
  { value: 'nmos', label: 'NMOS' },
  { value: 'pmos', label: 'PMOS' },
];

const ANALYTIC = [
  { value: 'all-region', label: 'All-region' },
  { value: 'square-law', label: 'Square law' },
];
const TABLE = { value: 'table', label: 'Tables' };

function temperaturePlaceholder(tnom: number, defaults: TargetDefaults | undefined): string {
  if (defaults && defaults.temperature !== null) return `sheet (${defaults.temperature})`;
  return `${tnom} (tnom)`;
}

/** The sizing targets of one device: what it is, where it runs, and what it must do. */
export function TargetsForm({ values, onChange, process, errors, defaults, readOnly }: TargetsFormProps) {
  const polarity = values.polarity;
  const quantity = (field: QuantityField, label = symbolOf(field, polarity)) => (
    <QuantityInput
      label={label}
      unit={QUANTITY_FIELDS[field].unit}
      placeholder={field === 'temperature' ? temperaturePlaceholder(process.tnom, defaults) : QUANTITY_FIELDS[field].placeholder}
      value={values[field]}
      onChange={(text) => onChange(field, text)}
      error={errors[field]}
    />
  );
  const flavours = process.flavours[polarity];
  // A device already on the table model keeps it on offer, so its choice shows even before the tables load.
  const models = process.tableModel || values.model === 'table' ? [...ANALYTIC, TABLE] : ANALYTIC;

  return (
    <Fieldset disabled={readOnly} variant="unstyled" aria-label="Sizing targets">
      <Stack gap="md">
        <Stack gap={6}>
          <Text size="sm" fw={500} id="polarity-label">
            Device
          </Text>
          <SegmentedControl
            aria-labelledby="polarity-label"
            size="xs"
            fullWidth
            value={polarity}
            onChange={(value) => onChange('polarity', value as Polarity)}
            data={POLARITIES}
          />
          <Group grow gap="xs" align="flex-start">
            <Select
              label="Flavour"
              size="xs"
              data={[{ value: '', label: 'standard' }, ...flavours.map((f) => ({ value: f, label: f }))]}
              value={values.flavour}
              onChange={(value) => onChange('flavour', value ?? '')}
              allowDeselect={false}
              error={errors.flavour}
            />
            <Select
              label="Corner"
              size="xs"
              data={defaults ? [{ value: '', label: `sheet (${defaults.corner})` }, ...process.corners] : process.corners}
              value={values.corner}
              onChange={(value) => value && onChange('corner', value)}
              allowDeselect={false}
              error={errors.corner}
            />
          </Group>
          <SegmentedControl
            aria-label="Current model"
            size="xs"
            fullWidth
            value={values.model}
            onChange={(value) => onChange('model', value as TargetsValues['model'])}
            data={models}
          />
          <Text size="xs" c="dimmed" aria-label="Model in use">
            {MODEL_LABELS[values.model]}
            {!process.tableModel && values.model !== 'table' && ' · the table model comes with a characterised model card'}
          </Text>
        </Stack>

        <SimpleGrid cols={2} spacing="xs" verticalSpacing="xs">
          {quantity('id')}
          {quantity('l')}
          {quantity('vds')}
          {quantity('vsb')}
          {quantity('temperature', 'Temperature')}
        </SimpleGrid>

        <ConstraintField
          values={values}
          polarity={polarity}
          error={errors[values.constraint]}
          onConstraintChange={(constraint) => onChange('constraint', constraint)}
          onValueChange={(constraint, text) => onChange(constraint, text)}
        />

        <Text size="xs" c="dimmed" role="note" aria-label="Polarity convention">
          {polarity === 'pmos'
            ? 'PMOS voltages are polarity-normalised: enter VSG, VSD and VBS as positive numbers; VT is shown as −VTP.'
            : `Voltages are NMOS-like; a PMOS is entered as VSG, VSD, VBS. VDD of this process: ${process.vdd} V.`}
        </Text>
      </Stack>
    </Fieldset>
  );
}
