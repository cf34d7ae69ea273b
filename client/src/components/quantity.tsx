import { formatQuantity } from '@channelwright/shared/units';
import { Text, type TextProps } from '@mantine/core';

interface QuantityProps extends Omit<TextProps, 'children'> {
  /** In SI units; null is shown as `nullText`. */
  value: number | null | undefined;
  unit?: string;
  digits?: number;
  /** What null means here, e.g. "∞" for ro when gds = 0. */
  nullText?: string;
}

/** A number in engineering notation with its unit, in tabular figures so columns of them line up. */
export function Quantity({ value, unit = '', digits = 4, nullText = '—', ...textProps }: QuantityProps) {
  const text = value === null || value === undefined ? nullText : formatQuantity(value, unit, { digits });
  return (
    <Text component="span" inherit style={{ fontVariantNumeric: 'tabular-nums', whiteSpace: 'nowrap' }} {...textProps}>
      {text}
    </Text>
  );
}
