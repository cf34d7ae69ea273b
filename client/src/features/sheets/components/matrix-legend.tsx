import { Group, Text } from '@mantine/core';
import { IconTarget } from '@tabler/icons-react';
import classes from './corner-matrix.module.css';
import { StatusIcon } from './matrix-cell';

/** What the colours and marks of the matrix mean; every mark has a shape as well as a colour. */
export function MatrixLegend() {
  const entry = (className: string, icon: React.ReactNode, text: string) => (
    <Text size="xs" component="span">
      <span className={`${classes.swatch} ${className}`} aria-hidden>
        {icon}
      </span>
      {text}
    </Text>
  );
  return (
    <Group gap="md" wrap="wrap" role="note" aria-label="Legend of the matrix">
      {entry(classes.ok, null, 'inside the limit')}
      {entry(classes.tight, <StatusIcon status="tight" size={11} />, 'tight: within 10 % of the limit')}
      {entry(classes.fail, <StatusIcon status="fail" size={11} />, 'fails the limit, or no answer')}
      {entry('', null, 'no limit set')}
      {entry(classes.worst, <IconTarget size={11} aria-hidden />, 'worst cell of the row (least margin, else the worse direction)')}
    </Group>
  );
}
