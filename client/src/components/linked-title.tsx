import { Anchor, Text } from '@mantine/core';
import { Link } from 'react-router-dom';

/** A list row's title: the link to the record, and its description on one dimmed line under it. */
export function LinkedTitle({ to, title, description }: { to: string; title: string; description?: string }) {
  return (
    <>
      <Anchor component={Link} to={to} fw={600} size="sm">
        {title}
      </Anchor>
      {description && (
        <Text size="xs" c="dimmed" lineClamp={1}>
          {description}
        </Text>
      )}
    </>
  );
}
