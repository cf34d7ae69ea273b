import type { Device, Sheet } from '@channelwright/shared/schemas';
import { Button, EmptyState, Group, Paper, Stack } from '@mantine/core';
import { IconDownload, IconPlus, IconTable } from '@tabler/icons-react';
import type { ReactNode } from 'react';
import { Link, useParams } from 'react-router-dom';
import { ErrorPanel } from '../../../components/error-panel';
import { PageHeader } from '../../../components/page-header';
import { PageLoader } from '../../../components/page-loader';
import { SheetBreadcrumbs, SheetConditions } from '../../../components/sheet-heading';
import { useProject } from '../../../lib/projects/project';
import { canEditSheets } from '../../../lib/projects/project-permissions';
import { useSheet } from '../../../lib/sheets/sheet';
import { useExportSheet } from '../api/export-sheet';
import { useRecomputeSheet } from '../api/recompute-sheet';
import { DeviceTable } from '../components/device-table';
import { SheetTotals } from '../components/sheet-totals';
import { StaleBanner } from '../components/stale-banner';

export interface SheetRouteProps {
  /** What the app puts between the sheet's conditions and its table (the revision and review panel). */
  reviewPanel?: (sheet: { id: string; name: string }) => ReactNode;
  /** What a designer may do with one device of the table (the devices' duplicate and delete); viewers get none. */
  deviceActions?: (device: Device, sheet: Sheet) => ReactNode;
}

/** A sizing sheet: every device of the circuit, its totals, and the way to the device pages. */
export default function SheetRoute({ reviewPanel, deviceActions }: SheetRouteProps = {}) {
  const { sheetId = '' } = useParams();
  const sheet = useSheet(sheetId);
  const project = useProject(sheet.data?.projectId);
  const recompute = useRecomputeSheet();
  const exportSheet = useExportSheet();

  if (sheet.isPending) return <PageLoader label="Loading the sheet" />;
  if (sheet.isError) return <ErrorPanel title="The sheet could not be loaded" message={sheet.error.message} onRetry={() => void sheet.refetch()} />;
  const data = sheet.data;
  const editable = project.data ? canEditSheets(project.data) : false;
  const deviceHref = (device: Device) => `/sheets/${data.id}/devices/${device.id}`;
  const rowActions = editable && deviceActions ? (device: Device) => deviceActions(device, data) : undefined;

  return (
    <Stack gap="sm">
      <SheetBreadcrumbs project={project.data} sheet={data} />
      <PageHeader
        title={data.name}
        description={data.description || undefined}
        actions={
          <Group gap="xs">
            <Button variant="default" size="xs" leftSection={<IconDownload size={14} />} loading={exportSheet.isPending} onClick={() => exportSheet.mutate({ sheetId: data.id, sheetName: data.name })}>
              Download CSV
            </Button>
            {editable && (
              <Button size="xs" leftSection={<IconPlus size={14} />} component={Link} to={`/sheets/${data.id}/devices/new`}>
                Add device
              </Button>
            )}
          </Group>
        }
      />
      <SheetConditions sheet={data} />
      <StaleBanner sheet={data} onRecompute={editable ? () => recompute.mutate(data.id) : undefined} recomputing={recompute.isPending} />
      {reviewPanel?.({ id: data.id, name: data.name })}
      {data.devices.length === 0 ? (
        <Paper withBorder radius="sm" p="xl">
          <EmptyState icon={<IconTable size={28} stroke={1.5} />}>
            <EmptyState.Title order={2}>No devices yet</EmptyState.Title>
            <EmptyState.Description>{editable ? 'Add the first transistor of the circuit to size it.' : 'The designers of this project have not added devices yet.'}</EmptyState.Description>
          </EmptyState>
        </Paper>
      ) : (
        <Paper withBorder radius="sm" p={0}>
          <DeviceTable devices={data.devices} deviceHref={deviceHref} rowActions={rowActions} />
        </Paper>
      )}
      <SheetTotals totals={data.totals} devices={data.devices} />
    </Stack>
  );
}
