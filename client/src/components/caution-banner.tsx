import { Group, Text, ThemeIcon } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';
import classes from './caution-banner.module.css';

export const CAUTION_TEXT =
  "Results are first-order estimates. Verify them with the foundry's device models and sign-off simulation before fabrication.";

/** The standing reminder shown above every working page; deliberately not dismissable. */
export function CautionBanner() {
  return (
    <Group role="note" aria-label="Caution" className={classes.banner} gap="xs" wrap="nowrap">
      <ThemeIcon size="sm" variant="transparent" color="oxide">
        <IconAlertTriangle size={16} stroke={1.8} />
      </ThemeIcon>
      <Text size="sm">{CAUTION_TEXT}</Text>
    </Group>
  );
}
