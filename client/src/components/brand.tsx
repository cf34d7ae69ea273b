import { Group, Text } from '@mantine/core';
import { LogoMark } from './logo-mark';

interface BrandProps {
  size?: 'sm' | 'lg';
}

/** The logo mark with the product name beside it. */
export function Brand({ size = 'sm' }: BrandProps) {
  const large = size === 'lg';
  return (
    <Group gap={large ? 'sm' : 8} wrap="nowrap">
      <LogoMark size={large ? 40 : 28} />
      <Text component="span" fw={600} fz={large ? 26 : 'lg'} lts={-0.3}>
        Channelwright
      </Text>
    </Group>
  );
}
