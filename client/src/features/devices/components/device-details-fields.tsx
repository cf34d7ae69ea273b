import { Checkbox, Group, TextInput, Textarea } from '@mantine/core';
import type { DetailErrors, DeviceDetails } from '../model/device-form';

interface DeviceDetailsFieldsProps {
  values: DeviceDetails;
  onChange: <K extends keyof DeviceDetails>(field: K, value: DeviceDetails[K]) => void;
  errors: DetailErrors;
  readOnly?: boolean;
  /** 'identity' is the name and function above the targets; 'circuit' the rest, under them. */
  part: 'identity' | 'circuit';
}

/** What the device is in the circuit: its name and function, match group, multiplier, supply branch, notes. */
export function DeviceDetailsFields({ values, onChange, errors, readOnly, part }: DeviceDetailsFieldsProps) {
  const text = (field: 'name' | 'function' | 'matchGroup' | 'multiplier', label: string, placeholder?: string) => (
    <TextInput
      label={label}
      size="xs"
      value={values[field]}
      placeholder={placeholder}
      onChange={(event) => onChange(field, event.currentTarget.value)}
      error={errors[field]}
      disabled={readOnly}
    />
  );
  if (part === 'identity') {
    return (
      <Group grow gap="xs" align="flex-start">
        {text('name', 'Name', 'M1')}
        {text('function', 'Function', 'input pair, tail source …')}
      </Group>
    );
  }
  return (
    <>
      <Group grow gap="xs" align="flex-start">
        {text('matchGroup', 'Match group', 'none')}
        {text('multiplier', 'Multiplier m')}
      </Group>
      <Checkbox
        size="xs"
        label="Supply branch (its ID counts in the sheet's supply current)"
        checked={values.supplyBranch}
        onChange={(event) => onChange('supplyBranch', event.currentTarget.checked)}
        disabled={readOnly}
      />
      <Textarea label="Notes" size="xs" rows={3} value={values.notes} onChange={(event) => onChange('notes', event.currentTarget.value)} error={errors.notes} disabled={readOnly} />
    </>
  );
}
