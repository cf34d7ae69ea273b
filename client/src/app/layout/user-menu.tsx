import { Avatar, Group, Menu, Text, UnstyledButton } from '@mantine/core';
import { IconChevronDown, IconLogout, IconMoon, IconSun } from '@tabler/icons-react';
import { useColorSchemeSwitch } from '../../components/color-scheme-toggle';
import { clearAuthToken } from '../../lib/session/auth-token';
import { useSignedInUser } from '../../lib/session/current-user';

function initialsOf(name: string): string {
  return name
    .split(/\s+/)
    .filter(Boolean)
    .slice(0, 2)
    .map((part) => part[0]?.toUpperCase())
    .join('');
}

/** Who is signed in, with the colour scheme switch and sign-out. */
export function UserMenu() {
  const user = useSignedInUser();
  const scheme = useColorSchemeSwitch();

  return (
    <Menu position="bottom-end" width={240} shadow="md">
      <Menu.Target>
        <UnstyledButton aria-label={`Account menu for ${user.displayName}`}>
          <Group gap={8} wrap="nowrap">
            <Avatar size={30} radius="xl" color="channel" variant="light">
              {initialsOf(user.displayName)}
            </Avatar>
            <Text size="sm" fw={500} visibleFrom="xs">
              {user.displayName}
            </Text>
            <IconChevronDown size={14} stroke={1.6} />
          </Group>
        </UnstyledButton>
      </Menu.Target>
      <Menu.Dropdown>
        <Menu.Label>
          {user.email} · {user.role === 'admin' ? 'administrator' : 'member'}
        </Menu.Label>
        <Menu.Item
          leftSection={scheme.next === 'dark' ? <IconMoon size={16} /> : <IconSun size={16} />}
          onClick={scheme.toggle}
        >
          Use the {scheme.next} scheme
        </Menu.Item>
        <Menu.Divider />
        <Menu.Item leftSection={<IconLogout size={16} />} onClick={clearAuthToken}>
          Sign out
        </Menu.Item>
      </Menu.Dropdown>
    </Menu>
  );
}
