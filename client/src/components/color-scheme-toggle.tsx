import { ActionIcon, Tooltip, useComputedColorScheme, useMantineColorScheme } from '@mantine/core';
import { IconMoon, IconSun } from '@tabler/icons-react';

/** Switches between the light and dark schemes; the choice is remembered in this browser. */
export function useColorSchemeSwitch() {
  const { setColorScheme } = useMantineColorScheme();
  const computed = useComputedColorScheme('light', { getInitialValueInEffect: false });
  const next = computed === 'dark' ? 'light' : 'dark';
  return { current: computed, next, toggle: () => setColorScheme(next) } as const;
}

export function ColorSchemeToggle() {
  const { next, toggle } = useColorSchemeSwitch();
  const label = `Use the ${next} scheme`;
  return (
    <Tooltip label={label}>
      <ActionIcon variant="subtle" color="gray" size="lg" aria-label={label} onClick={toggle}>
        {next === 'dark' ? <IconMoon size={18} stroke={1.6} /> : <IconSun size={18} stroke={1.6} />}
      </ActionIcon>
    </Tooltip>
  );
}
