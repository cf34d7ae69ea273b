import type { SizeResponse } from '@channelwright/shared/schemas';
import { Badge, Group } from '@mantine/core';
import { Quantity } from '../../../components/quantity';
import { regionWords } from '../../../lib/results/result-groups';
import { LabelledFigure } from '../../../components/labelled-figure';

const REGION_COLORS = { weak: 'grape', moderate: 'teal', strong: 'channel' } as const;

/** The answer at a glance: the width, its ratio, fingers and the region the device works in. */
export function OperatingSummary({ result }: { result: SizeResponse }) {
  return (
    <Group gap="xl" align="flex-end" wrap="wrap">
      <LabelledFigure size="lg" label="W">
        <Quantity value={result.w} unit="m" />
      </LabelledFigure>
      <LabelledFigure size="lg" label="W/L">
        <Quantity value={result.wOverL} />
      </LabelledFigure>
      <LabelledFigure size="lg" label="gm">
        <Quantity value={result.gm} unit="S" />
      </LabelledFigure>
      <LabelledFigure size="lg" label="gm/ID">
        <Quantity value={result.gmId} unit="1/V" digits={3} />
      </LabelledFigure>
      <Group gap={6} pb={4}>
        <Badge variant="light" color={REGION_COLORS[result.region]} radius="sm" tt="none">
          {regionWords(result.region)}
        </Badge>
        <Badge variant="outline" color={result.saturated ? 'gray' : 'oxide'} radius="sm" tt="none">
          {result.saturated ? 'saturated' : 'not saturated'}
        </Badge>
        <Badge variant="outline" color="gray" radius="sm" tt="none">
          {result.model} · {result.corner} · {result.temperature} °C
        </Badge>
      </Group>
    </Group>
  );
}
