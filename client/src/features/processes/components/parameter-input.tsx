import type { ParameterInfo } from '@channelwright/shared/schemas';
import { parseQuantity } from '@channelwright/shared/units';
import { Text, TextInput } from '@mantine/core';
import { useState, type ChangeEvent, type ReactNode } from 'react';
import { displayQuantity, inRange, rangeText } from '../utils/display-quantity';

interface ParameterInputProps {
  info: ParameterInfo;
  label: ReactNode;
  /** Controlled use: the text. */
  value?: string;
  /** Uncontrolled use (a large @mantine/form in uncontrolled mode): the starting text. */
  defaultValue?: string;
  onChange: (event: ChangeEvent<HTMLInputElement>) => void;
  onBlur?: () => void;
  onFocus?: () => void;
  /** The form's error for this field (the shared schema's, or the server's). */
  error?: ReactNode;
  withAsterisk?: boolean;
}

/**
 * A process-parameter field: takes SI prefixes and units ("310u", "310 µA/V²", "0.31m"), says what it read
 * in the parameter's display unit and its plausible range, and warns as soon as the value leaves that
 * range (a value outside it is unusual but accepted; the schema refuses only beyond the parameter's hard
 * limits). Only this field re-renders while the designer types.
 */
export function ParameterInput({ info, label, value, defaultValue, onChange, onBlur, onFocus, error, withAsterisk }: ParameterInputProps) {
  const [typed, setTyped] = useState(value ?? defaultValue ?? '');
  const text = value ?? typed;
  const parsed = text.trim() === '' ? undefined : parseQuantity(text, info.unit);
  const range = `plausible ${rangeText(info)}`;
  let hint: ReactNode = range;
  let warning: string | undefined;
  if (parsed?.ok) {
    if (!inRange(parsed.value, info)) warning = `${displayQuantity(parsed.value, info)} is outside the plausible range ${rangeText(info)}`;
    hint = `= ${displayQuantity(parsed.value, info, 6)} · ${range}`;
  }
  // Outside the plausible range: an orange warning; beyond the hard limits the form's own refusal in red.
  const shownError = parsed && !parsed.ok ? parsed.reason : error;

  return (
    <TextInput
      label={label}
      {...(value === undefined ? { defaultValue } : { value })}
      onChange={(event) => {
        setTyped(event.currentTarget.value);
        onChange(event);
      }}
      onBlur={onBlur}
      onFocus={onFocus}
      withAsterisk={withAsterisk}
      rightSection={info.displayUnit ? <Text size="xs" c="dimmed">{info.displayUnit}</Text> : undefined}
      rightSectionWidth={info.displayUnit ? 64 : undefined}
      rightSectionPointerEvents="none"
      description={hint}
      error={shownError ?? (warning ? <Text span size="xs" c="orange.8">{warning}</Text> : undefined)}
      styles={warning && !shownError ? { input: { borderColor: 'var(--mantine-color-orange-6)' } } : undefined}
      autoComplete="off"
      spellCheck={false}
    />
  );
}
