import { Center, Loader } from '@mantine/core';

export function PageLoader({ label = 'Loading' }: { label?: string }) {
  return (
    <Center py="xl" role="status" aria-label={label}>
      <Loader size="sm" />
    </Center>
  );
}
