import { AppShell, NavLink, Stack, Text } from '@mantine/core';
import { Link, useLocation } from 'react-router-dom';
import { usePublicConfig } from '../../lib/public-config';
import { useSignedInUser } from '../../lib/session/current-user';
import { isActivePath, navSectionsFor } from './nav-sections';

export function AppNavbar({ onNavigate }: { onNavigate: () => void }) {
  const user = useSignedInUser();
  const { pathname } = useLocation();
  const config = usePublicConfig();

  return (
    <>
      <AppShell.Section grow p="sm">
        <Stack gap="md">
          {navSectionsFor(user).map((section) => (
            <Stack key={section.title ?? 'work'} gap={2}>
              {section.title && (
                <Text size="xs" fw={600} c="dimmed" tt="uppercase" px="sm" pb={4} lts={0.5}>
                  {section.title}
                </Text>
              )}
              {section.items.map((item) => (
                <NavLink
                  key={item.path}
                  component={Link}
                  to={item.path}
                  label={item.label}
                  leftSection={<item.icon size={18} stroke={1.6} />}
                  active={isActivePath(item.path, pathname)}
                  variant="light"
                  onClick={onNavigate}
                  style={{ borderRadius: 'var(--mantine-radius-sm)' }}
                />
              ))}
            </Stack>
          ))}
        </Stack>
      </AppShell.Section>
      {config.data && (
        <AppShell.Section p="sm">
          <Text size="xs" c="dimmed">
            Channelwright {config.data.version}
          </Text>
        </AppShell.Section>
      )}
    </>
  );
}
