import { Anchor, Badge, Breadcrumbs, Group, Paper, SimpleGrid, Stack, Table, Text, Title } from '@mantine/core';
import { Link, useParams } from 'react-router-dom';
import { ErrorPanel } from '../../../components/error-panel';
import { NotFoundPage } from '../../../components/not-found-page';
import { PageHeader } from '../../../components/page-header';
import { PageLoader } from '../../../components/page-loader';
import { Quantity } from '../../../components/quantity';
import { ResultGroupTable } from '../../../components/result-group-table';
import { resultGroups } from '../../../lib/results/result-groups';
import { WARNING_TITLES } from '../../../lib/warning-titles';
import { useRevision } from '../api/get-revision';

const TARGET_ROWS = [
  ['id', 'ID', 'A'],
  ['l', 'L', 'm'],
  ['vds', 'VDS', 'V'],
  ['vsb', 'VSB', 'V'],
  ['vov', 'VOV', 'V'],
  ['gmId', 'gm/ID', '1/V'],
  ['w', 'W', 'm'],
  ['vgs', 'VGS', 'V'],
  ['temperature', 'Temperature', '°C'],
] as const;

/** One device of a revision, read-only: its frozen targets, every stored figure and its warnings. `/revisions/:revisionId/devices/:deviceId`. */
export default function RevisionDeviceRoute() {
  const { revisionId = '', deviceId = '' } = useParams();
  const revision = useRevision(revisionId);
  if (revision.isPending) return <PageLoader label="Loading the revision" />;
  if (revision.isError) return <ErrorPanel title="The revision could not be loaded" message={revision.error.message} onRetry={() => void revision.refetch()} />;
  const data = revision.data;
  const device = data.devices.find((d) => d.id === deviceId);
  if (!device) return <NotFoundPage />;
  const pmos = device.targets.polarity === 'pmos';
  const symbol = (name: string) => (pmos ? ({ VDS: 'VSD', VSB: 'VBS', VGS: 'VSG' } as Record<string, string>)[name] ?? name : name);

  return (
    <Stack gap="sm">
      <nav aria-label="Breadcrumbs">
        <Breadcrumbs separatorMargin={6} fz="sm">
          <Anchor component={Link} to={`/sheets/${data.sheetId}`} size="sm">{data.sheet.name}</Anchor>
          <Anchor component={Link} to={`/revisions/${data.id}`} size="sm">{data.label}</Anchor>
          <Text size="sm">{device.name}</Text>
        </Breadcrumbs>
      </nav>
      <PageHeader
        title={`${device.name} in ${data.sheet.name} ${data.label}`}
        description={device.targets.function || undefined}
        actions={
          <Group gap={6}>
            <Badge color="gray" variant="outline" radius="sm" tt="none">read only: frozen in {data.label}</Badge>
            <Badge variant="light" radius="sm" tt="none">{data.process.name} v{data.process.version}</Badge>
          </Group>
        }
      />
      <Paper withBorder radius="sm" p="sm" component="section" aria-label="Frozen targets">
        <Title order={2} fz="md" mb="xs">Targets</Title>
        <Table fz="sm" verticalSpacing={3} withRowBorders={false} aria-label="Targets">
          <Table.Tbody>
            <Table.Tr><Table.Th scope="row">Polarity</Table.Th><Table.Td>{device.targets.polarity.toUpperCase()}{device.targets.flavour ? ` (${device.targets.flavour})` : ''}</Table.Td></Table.Tr>
            <Table.Tr><Table.Th scope="row">Corner · model</Table.Th><Table.Td>{device.targets.corner ?? `sheet (${data.sheet.corner})`} · {device.targets.model ?? data.sheet.model}</Table.Td></Table.Tr>
            {TARGET_ROWS.filter(([key]) => device.targets[key] !== undefined).map(([key, label, unit]) => (
              <Table.Tr key={key}>
                <Table.Th scope="row">{symbol(label)}</Table.Th>
                <Table.Td><Quantity value={device.targets[key] as number} unit={unit} /></Table.Td>
              </Table.Tr>
            ))}
            <Table.Tr><Table.Th scope="row">Multiplier · match group</Table.Th><Table.Td>{device.targets.multiplier} · {device.targets.matchGroup ?? 'none'}</Table.Td></Table.Tr>
          </Table.Tbody>
        </Table>
      </Paper>
      {device.error && (
        <Text c="red" size="sm" role="alert">
          Not sized when frozen: {device.error.message}
        </Text>
      )}
      {device.result && (
        <>
          <SimpleGrid cols={{ base: 1, md: 2, xl: 3 }} spacing="xs" verticalSpacing="xs" aria-label="Every stored figure" role="region">
            {resultGroups(device.result, device.targets.polarity).map((group) => (
              <ResultGroupTable key={group.title} group={group} />
            ))}
          </SimpleGrid>
          <Stack gap={4} aria-label="Warnings" role="list">
            {device.result.warnings.length === 0 ? (
              <Text size="sm" c="dimmed">No warnings when frozen.</Text>
            ) : (
              device.result.warnings.map((warning) => (
                <Text key={warning.code} size="sm" role="listitem">
                  <b>{WARNING_TITLES[warning.code]}.</b> {warning.message}
                </Text>
              ))
            )}
          </Stack>
        </>
      )}
    </Stack>
  );
}
