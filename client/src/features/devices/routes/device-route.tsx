import { Badge, Group, Stack, Title } from '@mantine/core';
import type { ReactNode } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { ErrorPanel } from '../../../components/error-panel';
import { NotFoundPage } from '../../../components/not-found-page';
import { PageHeader } from '../../../components/page-header';
import { PageLoader } from '../../../components/page-loader';
import { SheetBreadcrumbs, SheetConditions } from '../../../components/sheet-heading';
import { useProcess } from '../../../lib/processes/process';
import { useProject } from '../../../lib/projects/project';
import { canEditSheets } from '../../../lib/projects/project-permissions';
import { sheetQueryOptions, useSheet } from '../../../lib/sheets/sheet';
import { DeviceEditor } from '../components/device-editor';
import { valuesOfDevice, valuesOfNewDevice } from '../model/device-form';
import { nextDeviceName } from '../model/device-names';
import type { SizedDeviceView } from '../model/sized-device';

export interface DeviceRouteProps {
  /** Drawn under the results once the device is sized: the app passes the design charts. */
  charts?: SizedDeviceView;
  /** A stored, sized device across corners and temperatures: the app passes the sheets' corner matrix. */
  corners?: (device: { sheetId: string; deviceId: string }) => ReactNode;
}

/** The device page of a sheet: `/sheets/:sheetId/devices/:deviceId`, or `…/devices/new` to add one. */
export default function DeviceRoute({ charts, corners }: DeviceRouteProps = {}) {
  const { sheetId = '', deviceId = 'new' } = useParams();
  const queryClient = useQueryClient();
  const sheet = useSheet(sheetId);
  const project = useProject(sheet.data?.projectId);
  const profile = useProcess(sheet.data?.process.profileId, sheet.data?.process.version);

  if (sheet.isError) return <ErrorPanel title="The sheet could not be loaded" message={sheet.error.message} onRetry={() => void sheet.refetch()} />;
  if (profile.isError) return <ErrorPanel title="The sheet's process could not be loaded" message={profile.error.message} onRetry={() => void profile.refetch()} />;
  if (!sheet.data || !profile.data || !project.data) return <PageLoader label="Loading the device" />;
  const data = sheet.data;
  const isNew = deviceId === 'new';
  const device = isNew ? undefined : data.devices.find((d) => d.id === deviceId);
  if (!isNew && !device) return sheet.isFetching ? <PageLoader label="Loading the device" /> : <NotFoundPage />;
  const editable = canEditSheets(project.data);
  if (isNew && !editable) return <NotFoundPage />;

  const initial = device ? valuesOfDevice(device, data) : valuesOfNewDevice(data, nextDeviceName(data.devices.map((d) => d.targets.name)));
  const reloadStored = async () => {
    const fresh = await queryClient.fetchQuery({ ...sheetQueryOptions(sheetId), staleTime: 0 });
    return fresh.devices.find((d) => d.id === deviceId);
  };
  const title = device ? device.targets.name : 'New device';

  return (
    <Stack gap="sm">
      <SheetBreadcrumbs project={project.data} sheet={data} device={title} />
      <PageHeader
        title={title}
        description={device?.targets.function || (isNew ? 'Type the targets; the results follow as you type. Save to add it to the sheet.' : undefined)}
        actions={
          <Group gap={6}>
            {device?.stale && (
              <Badge color="oxide" variant="light" radius="sm" tt="none">
                stored result is stale
              </Badge>
            )}
            {!editable && (
              <Badge color="gray" variant="outline" radius="sm" tt="none">
                read only
              </Badge>
            )}
          </Group>
        }
      />
      <SheetConditions sheet={data} />
      <DeviceEditor key={device?.id ?? 'new'} sheet={data} process={profile.data.version.definition} device={device} initial={initial} editable={editable} reloadStored={reloadStored} charts={charts} />
      {corners && device?.result && (
        <Stack gap="xs" component="section" aria-label="Across corners">
          <Title order={2} fz="md">
            Across corners and temperatures (as stored)
          </Title>
          {corners({ sheetId: data.id, deviceId: device.id })}
        </Stack>
      )}
    </Stack>
  );
}
