import { Group, List, Paper, Text } from '@mantine/core';
import { InventedDataBadge } from '../../../components/invented-data-badge';

const DEMO_ACCOUNTS = [
  { email: 'designer@brackenfold.example', job: 'analog designer' },
  { email: 'reviewer@brackenfold.example', job: 'senior designer' },
  { email: 'viewer@brackenfold.example', job: 'layout engineer' },
  { email: 'admin@brackenfold.example', job: 'administrator' },
] as const;

/** The demo's accounts, so a first visitor can look around; their password is in README.md. */
export function DemoAccounts() {
  return (
    <Paper withBorder p="md" radius="md" bg="transparent">
      <Group justify="space-between" mb="xs">
        <Text size="sm" fw={600}>
          Demo accounts
        </Text>
        <InventedDataBadge />
      </Group>
      <List size="sm" spacing={2} listStyleType="none">
        {DEMO_ACCOUNTS.map((account) => (
          <List.Item key={account.email}>
            <Text span size="sm" ff="monospace">
              {account.email}
            </Text>{' '}
            <Text span size="xs" c="dimmed">
              {account.job}
            </Text>
          </List.Item>
        ))}
      </List>
      <Text size="xs" c="dimmed" mt="xs">
        The shared demo password is printed in README.md and when the server starts.
      </Text>
    </Paper>
  );
}
