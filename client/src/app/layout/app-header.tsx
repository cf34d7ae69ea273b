import { Burger, Group, UnstyledButton } from '@mantine/core';
import { Link } from 'react-router-dom';
import { Brand } from '../../components/brand';
import { InventedDataBadge } from '../../components/invented-data-badge';
import { usePublicConfig } from '../../lib/public-config';
import { UserMenu } from './user-menu';

interface AppHeaderProps {
  navbarOpen: boolean;
  onToggleNavbar: () => void;
}

export function AppHeader({ navbarOpen, onToggleNavbar }: AppHeaderProps) {
  const config = usePublicConfig();
  return (
    <Group h="100%" px="md" justify="space-between" wrap="nowrap">
      <Group gap="sm" wrap="nowrap">
        <Burger
          opened={navbarOpen}
          onClick={onToggleNavbar}
          hiddenFrom="sm"
          size="sm"
          aria-label={navbarOpen ? 'Close navigation' : 'Open navigation'}
        />
        <UnstyledButton component={Link} to="/" aria-label="Channelwright home">
          <Brand />
        </UnstyledButton>
        {config.data?.demo && <InventedDataBadge />}
      </Group>
      <UserMenu />
    </Group>
  );
}
