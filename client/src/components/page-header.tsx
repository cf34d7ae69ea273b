import { Group, Stack, Text, Title } from '@mantine/core';
import type { ReactNode } from 'react';
import { useDocumentTitle } from '../lib/use-document-title';

interface PageHeaderProps {
  title: string;
  description?: ReactNode;
  actions?: ReactNode;
}

/** The title block every page opens with, so pages line up the same way; it also names the browser tab. */
export function PageHeader({ title, description, actions }: PageHeaderProps) {
  useDocumentTitle(title);
  return (
    <Group justify="space-between" align="flex-end" mb="lg" wrap="wrap">
      <Stack gap={4}>
        <Title order={1} fz={26}>
          {title}
        </Title>
        {description && (
          <Text c="dimmed" size="sm">
            {description}
          </Text>
        )}
      </Stack>
      {actions}
    </Group>
  );
}
