import { Box, Center, Group, Paper, Stack, Text, Title } from '@mantine/core';
import type { ReactNode } from 'react';
import { Brand } from '../../../components/brand';
import { ColorSchemeToggle } from '../../../components/color-scheme-toggle';
import { useDocumentTitle } from '../../../lib/use-document-title';
import classes from './auth-layout.module.css';

interface AuthLayoutProps {
  title: string;
  children: ReactNode;
  /** Below the card: links to the other auth page, demo hints. */
  footer?: ReactNode;
}

/** The frame of the pages before sign-in: the product's name and job, then one card. */
export function AuthLayout({ title, children, footer }: AuthLayoutProps) {
  useDocumentTitle(title);
  return (
    <Box className={classes.page}>
      <Group justify="flex-end" p="md">
        <ColorSchemeToggle />
      </Group>
      <Center px="md" pb="xl">
        <Stack w="100%" maw={400} gap="lg">
          <Stack gap={6} align="center">
            <Brand size="lg" />
            <Text c="dimmed" size="sm" ta="center">
              Size MOS transistors, then have the sizing reviewed and signed off.
            </Text>
          </Stack>
          <Paper withBorder shadow="xs" p="xl" radius="md">
            <Title order={1} fz="h3" mb="lg">
              {title}
            </Title>
            {children}
          </Paper>
          {footer}
        </Stack>
      </Center>
    </Box>
  );
}
