import type { RevisionState } from '@channelwright/shared/schemas';
import { Badge, type BadgeProps } from '@mantine/core';
import { REVISION_STATE_LOOK } from '../model/revision-state-look';

/** A revision's (or a sheet's) review state as a coloured badge. */
export function RevisionStateBadge({ state, ...props }: { state: RevisionState } & Omit<BadgeProps, 'color' | 'children'>) {
  const look = REVISION_STATE_LOOK[state];
  return (
    <Badge color={look.color} variant="light" radius="sm" tt="none" title={look.hint} {...props}>
      {look.label}
    </Badge>
  );
}
