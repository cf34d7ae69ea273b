import type { Device, Sheet } from '@channelwright/shared/schemas';
import { Button, EmptyState, Group, Paper, Stack, Tabs } from '@mantine/core';
import { IconArrowsExchange, IconFileImport, IconPlus, IconSettings, IconTable } from '@tabler/icons-react';
import { useState, type ReactNode } from 'react';
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { ErrorPanel } from '../../../components/error-panel';
import { PageHeader } from '../../../components/page-header';
import { PageLoader } from '../../../components/page-loader';
import { RegionErrorBoundary } from '../../../components/region-error-boundary';
import { SheetBreadcrumbs, SheetConditions } from '../../../components/sheet-heading';
import { useProject } from '../../../lib/projects/project';
import { canEditSheets } from '../../../lib/projects/project-permissions';
import { useSheet } from '../../../lib/sheets/sheet';
import { useRecomputeSheet } from '../api/recompute-sheet';
import { CornerMatrix } from '../components/corner-matrix';
import { DeviceTable } from '../components/device-table';
import { ExportMenu } from '../components/export-menu';
import { ImportDialog } from '../components/import-dialog';
import { LeakagePanel } from '../components/leakage-panel';
import { MatchGroupsPanel } from '../components/match-groups-panel';
import { MigrateDialog } from '../components/migrate-dialog';
import { SheetSettingsDialog } from '../components/sheet-settings-dialog';
import { SheetTotals } from '../components/sheet-totals';
import { StaleBanner } from '../components/stale-banner';

export interface SheetRouteProps {
  /** What the app puts between the sheet's conditions and its table (the revision and review panel). */
  reviewPanel?: (sheet: { id: string; name: string }) => ReactNode;
  /** What a designer may do with one device of the table (the devices' duplicate and delete); viewers get none. */
  deviceActions?: (device: Device, sheet: Sheet) => ReactNode;
}

const VIEWS = ['devices', 'corners', 'matching', 'leakage'] as const;
type View = (typeof VIEWS)[number];

type Dialog = 'import' | 'migrate' | 'settings' | null;

/** A sizing sheet: every device of the circuit and its totals, the corner matrix, the match groups and the leakage budget. */
export default function SheetRoute({ reviewPanel, deviceActions }: SheetRouteProps = {}) {
  const { sheetId = '' } = useParams();
  const [search, setSearch] = useSearchParams();
  const sheet = useSheet(sheetId);
  const project = useProject(sheet.data?.projectId);
  const recompute = useRecomputeSheet();
  const [dialog, setDialog] = useState<Dialog>(null);
  const view: View = VIEWS.includes(search.get('view') as View) ? (search.get('view') as View) : 'devices';

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
          <Group gap="xs" wrap="wrap">
            <ExportMenu sheetId={data.id} sheetName={data.name} />
            {editable && (
              <>
                <Button variant="default" size="xs" leftSection={<IconFileImport size={14} />} onClick={() => setDialog('import')}>
                  Import CSV
                </Button>
                <Button variant="default" size="xs" leftSection={<IconArrowsExchange size={14} />} onClick={() => setDialog('migrate')}>
                  Migrate
                </Button>
                <Button variant="default" size="xs" leftSection={<IconSettings size={14} />} onClick={() => setDialog('settings')}>
                  Settings
                </Button>
                <Button size="xs" leftSection={<IconPlus size={14} />} component={Link} to={`/sheets/${data.id}/devices/new`}>
                  Add device
                </Button>
              </>
            )}
          </Group>
        }
      />
      <SheetConditions sheet={data} />
      <StaleBanner sheet={data} onRecompute={editable ? () => recompute.mutate(data.id) : undefined} recomputing={recompute.isPending} />
      {reviewPanel?.({ id: data.id, name: data.name })}
      <Tabs value={view} onChange={(value) => setSearch(value && value !== 'devices' ? { view: value } : {}, { replace: true })} keepMounted={false}>
        <Tabs.List>
          <Tabs.Tab value="devices">Devices</Tabs.Tab>
          <Tabs.Tab value="corners">Corner matrix</Tabs.Tab>
          <Tabs.Tab value="matching">Matched groups</Tabs.Tab>
          <Tabs.Tab value="leakage">Leakage budget</Tabs.Tab>
        </Tabs.List>
        <Tabs.Panel value="devices" pt="sm">
          <Stack gap="sm">
            {data.devices.length === 0 ? (
              <Paper withBorder radius="sm" p="xl">
                <EmptyState icon={<IconTable size={28} stroke={1.5} />}>
                  <EmptyState.Title order={2}>No devices yet</EmptyState.Title>
                  <EmptyState.Description>{editable ? 'Add the first transistor of the circuit to size it, or import a CSV.' : 'The designers of this project have not added devices yet.'}</EmptyState.Description>
                </EmptyState>
              </Paper>
            ) : (
              <Paper withBorder radius="sm" p={0}>
                <DeviceTable devices={data.devices} deviceHref={deviceHref} rowActions={rowActions} />
              </Paper>
            )}
            <SheetTotals totals={data.totals} devices={data.devices} />
          </Stack>
        </Tabs.Panel>
        <Tabs.Panel value="corners" pt="sm">
          <RegionErrorBoundary region="the corner matrix">
            <CornerMatrix sheetId={data.id} deviceHref={(id) => `/sheets/${data.id}/devices/${id}`} />
          </RegionErrorBoundary>
        </Tabs.Panel>
        <Tabs.Panel value="matching" pt="sm">
          <RegionErrorBoundary region="the matched groups">
            <MatchGroupsPanel sheet={data} editable={editable} />
          </RegionErrorBoundary>
        </Tabs.Panel>
        <Tabs.Panel value="leakage" pt="sm">
          <RegionErrorBoundary region="the leakage budget">
            <LeakagePanel sheetId={data.id} />
          </RegionErrorBoundary>
        </Tabs.Panel>
      </Tabs>
      {editable && (
        <>
          <ImportDialog sheetId={data.id} opened={dialog === 'import'} onClose={() => setDialog(null)} />
          <MigrateDialog sheet={data} opened={dialog === 'migrate'} onClose={() => setDialog(null)} />
          <SheetSettingsDialog key={`${data.id}-${data.version}`} sheet={data} opened={dialog === 'settings'} onClose={() => setDialog(null)} />
        </>
      )}
    </Stack>
  );
}
