import { formatQuantity } from '@channelwright/shared/units';
import { Button, Group, Select, Text } from '@mantine/core';
import { IconRuler2 } from '@tabler/icons-react';
import { Link } from 'react-router-dom';

interface SizeDevicePickerProps {
  lengths: number[];
  l: number;
  onLengthChange: (l: number) => void;
  gmId: number;
  /** Where the device opens; absent when the page is not given a device page to open. */
  href?: string;
}

/**
 * The keyboard's way to what a click on a chart does: a length (beside the gm/ID field) and the link that opens a
 * device at that length and gm/ID.
 */
export function SizeDevicePicker({ lengths, l, onLengthChange, gmId, href }: SizeDevicePickerProps) {
  const text = `Size a device at L = ${formatQuantity(l, 'm', { digits: 3 })}, gm/ID = ${formatQuantity(gmId, '1/V', { digits: 3 })}`;
  return (
    <Group gap="sm" align="flex-end" wrap="wrap">
      <Select
        label="Length"
        size="xs"
        w={130}
        allowDeselect={false}
        data={lengths.map((length) => ({ value: String(length), label: formatQuantity(length, 'm', { digits: 3 }) }))}
        value={String(l)}
        onChange={(value) => value !== null && onLengthChange(Number(value))}
      />
      {href && (
        <Button component={Link} to={href} size="xs" variant="light" leftSection={<IconRuler2 size={14} />}>
          {text}
        </Button>
      )}
      <Text size="xs" c="dimmed">
        or click a point on a chart
      </Text>
    </Group>
  );
}
