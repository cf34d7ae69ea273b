import { Stack, Text } from '@mantine/core';
import type { ReactNode } from 'react';

interface LabelledFigureProps {
  label: string;
  children: ReactNode;
  /** A dimmed line under the figure: what it covers. */
  hint?: string;
  size?: 'sm' | 'lg';
}

/** A figure with its label above it, named by that label for assistive technology. */
export function LabelledFigure({ label, children, hint, size = 'sm' }: LabelledFigureProps) {
  return (
    <Stack gap={0}>
      <Text size="xs" c="dimmed">
        {label}
      </Text>
      <Text size={size} fw={600} aria-label={label}>
        {children}
      </Text>
      {hint && (
        <Text size="xs" c="dimmed">
          {hint}
        </Text>
      )}
    </Stack>
  );
}
