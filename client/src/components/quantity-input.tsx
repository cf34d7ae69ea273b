import { parseQuantity, formatQuantity } from '@channelwright/shared/units';
import { Text, TextInput, type TextInputProps } from '@mantine/core';
import type { ReactNode } from 'react';

interface QuantityInputProps extends Omit<TextInputProps, 'value' | 'onChange' | 'description' | 'error'> {
  label: ReactNode;
  /** The SI unit the field takes: "A", "m", "V", "1/V", "°C" … */
  unit: string;
  value: string;
  onChange: (text: string) => void;
  /** A refusal from the form or the server, shown under the field instead of the parsed value. */
  error?: ReactNode;
}

/**
 * A text field for a quantity: accepts SI prefixes with or without the unit ("20u", "20 µA", "0.5um")
 * and shows what it read, in engineering notation, under the field ("= 20 µA").
 */
export function QuantityInput({ label, unit, value, onChange, error, ...inputProps }: QuantityInputProps) {
  const parsed = value.trim() === '' ? null : parseQuantity(value, unit);
  const readBack = parsed?.ok ? `= ${formatQuantity(parsed.value, unit)}` : undefined;
  const shownError = error ?? (parsed && !parsed.ok ? parsed.reason : undefined);
  return (
    <TextInput
      label={label}
      value={value}
      onChange={(event) => onChange(event.currentTarget.value)}
      error={shownError}
      description={shownError ? undefined : readBack}
      inputWrapperOrder={['label', 'input', 'description', 'error']}
      rightSection={
        unit ? (
          <Text size="xs" c="dimmed" aria-hidden>
            {unit}
          </Text>
        ) : undefined
      }
      rightSectionWidth={unit.length > 2 ? 44 : 32}
      rightSectionPointerEvents="none"
      autoComplete="off"
      spellCheck={false}
      {...inputProps}
    />
  );
}
