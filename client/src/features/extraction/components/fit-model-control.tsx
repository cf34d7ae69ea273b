import { SegmentedControl, type SegmentedControlProps, Stack, Text } from '@mantine/core';

/** The model a fit adjusts (all-region or square law), labelled for screen readers by its own heading. */
export function FitModelControl({ id, value, onChange }: { id: string } & Pick<SegmentedControlProps, 'value' | 'onChange'>) {
  return (
    <Stack gap={4}>
      <Text size="sm" fw={500} id={id}>
        Model to fit
      </Text>
      <SegmentedControl
        aria-labelledby={id}
        data={[
          { value: 'all-region', label: 'All-region' },
          { value: 'square-law', label: 'Square law' },
        ]}
        value={value}
        onChange={onChange}
      />
    </Stack>
  );
}
