import { MATRIX_FIGURES_OF_BIAS, type MatrixFigure, type SheetCornersRequestInput } from '@channelwright/shared/schemas';
import { parseQuantity } from '@channelwright/shared/units';
import { Alert, Anchor, Group, Loader, Paper, SegmentedControl, Select, Skeleton, Stack, Table, Text, TextInput } from '@mantine/core';
import { Fragment, useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { useSheetCorners } from '../api/sheet-corners';
import { columnText, figureLabel, limitText, temperatureText } from '../model/matrix-figures';
import { MatrixCell } from './matrix-cell';
import { MatrixLegend } from './matrix-legend';
import { SkippedDevices } from './skipped-devices';

interface CornerMatrixProps {
  sheetId: string;
  /** Only these devices (the device page passes its own); every sized device of the sheet when absent. */
  deviceIds?: string[];
  /** Where a device's name links to. */
  deviceHref?: (deviceId: string) => string;
}

const TOLERANCES = [
  { value: '0', label: 'VDD only' },
  { value: '0.05', label: 'VDD ± 5 %' },
  { value: '0.1', label: 'VDD ± 10 %' },
];

/** "85, 150" → [85, 150]; null when a part does not read as a temperature. */
function readTemperatures(text: string): number[] | null {
  const parts = text.split(/[,;]/).map((p) => p.trim()).filter(Boolean);
  const values = parts.map((p) => parseQuantity(p, '°C'));
  return values.every((v) => v.ok) ? values.map((v) => (v.ok ? v.value : 0)) : null;
}

/**
 * The corner and temperature matrix: each sized device, W and L fixed, at every corner × temperature (× supply),
 * one chosen figure in the cells, coloured by its margin to the limits the designer set on the device, the
 * worst cell of each row marked with its corner and temperature.
 */
export function CornerMatrix({ sheetId, deviceIds, deviceHref }: CornerMatrixProps) {
  const [bias, setBias] = useState<'current' | 'voltage'>('current');
  const [figure, setFigure] = useState<MatrixFigure>('headroom');
  const [tolerance, setTolerance] = useState('0');
  const [extraText, setExtraText] = useState('');
  const extra = readTemperatures(extraText);
  const request = useMemo<SheetCornersRequestInput>(
    () => ({ bias, ...(deviceIds ? { deviceIds } : {}), ...(Number(tolerance) > 0 ? { vddTolerance: Number(tolerance) } : {}), ...(extra && extra.length > 0 ? { temperatures: extra } : {}) }),
    // extra is derived from extraText; its array identity changes every render.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [bias, deviceIds?.join(','), tolerance, extraText],
  );
  const matrix = useSheetCorners(sheetId, request);
  const figures = MATRIX_FIGURES_OF_BIAS[bias] as readonly MatrixFigure[];
  const shown = figures.includes(figure) ? figure : figures[0];
  const withSupply = Number(tolerance) > 0;

  const controls = (
    <Group gap="sm" align="flex-end" wrap="wrap">
      <Stack gap={4}>
        <Text size="sm" fw={500} id="matrix-bias">Held</Text>
        <SegmentedControl aria-labelledby="matrix-bias" size="xs" value={bias} onChange={(value) => setBias(value as 'current' | 'voltage')} data={[{ value: 'current', label: 'ID (current-biased)' }, { value: 'voltage', label: 'VGS (voltage-biased)' }]} />
      </Stack>
      <Select label="Figure in the cells" size="xs" w={200} data={figures.map((f) => ({ value: f, label: figureLabel(f) }))} value={shown} onChange={(value) => value && setFigure(value as MatrixFigure)} allowDeselect={false} />
      <Select label="Supply" size="xs" w={140} data={TOLERANCES} value={tolerance} onChange={(value) => setTolerance(value ?? '0')} allowDeselect={false} />
      <TextInput label="Add temperatures (°C)" size="xs" w={180} placeholder="85, 150" value={extraText} onChange={(event) => setExtraText(event.currentTarget.value)} error={extra === null ? 'Temperatures in °C, separated by commas' : undefined} />
      {matrix.isFetching && <Loader size={16} aria-label="Updating the matrix" />}
    </Group>
  );

  if (matrix.isPending) return <Stack gap="sm">{controls}<Skeleton height={160} aria-label="Loading the matrix" /></Stack>;
  if (matrix.isError) return <Stack gap="sm">{controls}<Alert color="red" variant="light" title="The matrix could not be computed" role="alert">{matrix.error.message}</Alert></Stack>;
  const { columns, rows, skipped } = matrix.data;
  const span = withSupply ? 3 : 1;
  const corners = [...new Set(columns.map((c) => c.corner))];
  const perCorner = columns.length / corners.length;

  if (rows.length === 0) {
    return (
      <Stack gap="sm">
        {controls}
        {skipped.length > 0 ? <SkippedDevices skipped={skipped} nothingChecked what="the matrix" /> : <Text size="sm" c="dimmed">No devices on this sheet yet.</Text>}
      </Stack>
    );
  }

  return (
    <Stack gap="sm">
      {controls}
      <Paper withBorder radius="sm" p={0}>
        <Table.ScrollContainer minWidth={Math.max(720, 140 + columns.length * 74)}>
          <Table aria-label="Corner matrix" fz="xs" verticalSpacing={4} horizontalSpacing={6} withColumnBorders={false}>
            <Table.Thead>
              <Table.Tr>
                <Table.Th rowSpan={withSupply ? 3 : 2}>Device</Table.Th>
                <Table.Th rowSpan={withSupply ? 3 : 2}>Worst</Table.Th>
                {corners.map((corner) => (
                  <Table.Th key={corner} colSpan={perCorner} ta="center" style={{ borderLeft: '1px solid var(--mantine-color-default-border)' }}>
                    {corner}
                  </Table.Th>
                ))}
              </Table.Tr>
              <Table.Tr>
                {columns.filter((_, i) => i % span === 0).map((column, i) => (
                  <Table.Th key={`${column.corner}-${column.temperature}`} colSpan={span} ta="right" style={i % (perCorner / span) === 0 ? { borderLeft: '1px solid var(--mantine-color-default-border)' } : undefined}>
                    {temperatureText(column.temperature)}
                  </Table.Th>
                ))}
              </Table.Tr>
              {withSupply && (
                <Table.Tr>
                  {columns.map((column, i) => (
                    <Table.Th key={i} ta="right" fw={400}>{column.vdd.toFixed(2)} V</Table.Th>
                  ))}
                </Table.Tr>
              )}
            </Table.Thead>
            <Table.Tbody>
              {rows.map((row) => {
                const worst = row.worst[shown];
                return (
                  <Table.Tr key={row.deviceId} data-device={row.name}>
                    <Table.Th scope="row" style={{ whiteSpace: 'nowrap' }}>
                      {deviceHref ? <Anchor component={Link} to={deviceHref(row.deviceId)} size="xs" fw={600}>{row.name}</Anchor> : row.name}
                      {row.limits.filter((l) => l.figure === shown).map((limit) => (
                        <Text key={limit.figure} size="xs" c="dimmed" fw={400}>{limitText(limit, row.polarity)}</Text>
                      ))}
                    </Table.Th>
                    {/* Beside the name, so a wide matrix still shows where each row is worst without scrolling. */}
                    <Table.Td style={{ whiteSpace: 'nowrap' }} aria-label={`Worst cell of ${row.name}`}>
                      {worst ? columnText(columns[worst.column], withSupply) : '—'}
                    </Table.Td>
                    {row.cells.map((cell, index) => (
                      <Fragment key={index}>
                        <MatrixCell cell={cell} figure={shown} where={`${row.name} at ${columnText(columns[index], withSupply)}`} worst={worst?.column === index} groupStart={index % perCorner === 0} />
                      </Fragment>
                    ))}
                  </Table.Tr>
                );
              })}
            </Table.Tbody>
          </Table>
        </Table.ScrollContainer>
      </Paper>
      <MatrixLegend />
      <Text size="xs" c="dimmed">
        {bias === 'current' ? 'ID held at the stored result, VGS solved at each point (as in a mirror).' : 'VGS held at the stored result, ID follows.'} W and L as drawn; each device keeps its {figureLabel('headroom').split(' ')[0]}.{' '}
        {withSupply ? 'The supply sets the gate-drive ceiling and the off-state VDS. ' : ''}First-order estimates: verify with the foundry&apos;s models and sign-off simulation.
      </Text>
      <SkippedDevices skipped={skipped} nothingChecked={false} what="the matrix" />
    </Stack>
  );
}
