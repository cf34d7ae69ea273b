import { Button } from '@mantine/core';
import { IconSend } from '@tabler/icons-react';
import { useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { ErrorPanel } from '../../../components/error-panel';
import { PageHeader } from '../../../components/page-header';
import { PageLoader } from '../../../components/page-loader';
import { useProcess } from '../../../lib/processes/process';
import { useProcessProfiles } from '../../../lib/processes/process-profiles';
import { DeviceWorkbench } from '../components/device-workbench';
import { ProcessPicker } from '../components/process-picker';
import { SendToSheetDialog } from '../components/send-to-sheet-dialog';
import { useTargetsForm } from '../hooks/use-targets-form';
import type { SizedDeviceView } from '../model/sized-device';
import { prefillFromSearch } from '../model/workbench-link';

export interface ScratchDeviceRouteProps {
  /** Drawn under the results once the device is sized: the app passes the design charts. */
  charts?: SizedDeviceView;
}

/**
 * Size a device without a sheet: pick a process, type the targets, read the results. Nothing is stored.
 * Another page may open it with a process, a version and targets in the search parameters (see workbench-link).
 */
export default function ScratchDeviceRoute({ charts }: ScratchDeviceRouteProps = {}) {
  const [params] = useSearchParams();
  // Read once: the link gives the starting point, the designer's typing takes over from there.
  const [start] = useState(() => prefillFromSearch(params));
  const profiles = useProcessProfiles();
  const [chosenId, setChosenId] = useState<string | null>(start.processId ?? null);
  const available = profiles.data?.filter((p) => !p.deprecated) ?? [];
  const summary = available.find((p) => p.id === chosenId) ?? available[0];
  // The linked version (e.g. the one whose tables drew the charts) until another process is picked.
  const version = summary && summary.id === start.processId && start.version ? start.version : summary?.latestVersion;
  const profile = useProcess(summary?.id, version);
  const { values, setField } = useTargetsForm(start.values);
  const [sending, setSending] = useState(false);

  const header = (
    <PageHeader
      title="Size a device"
      description="A scratch pad: results follow your typing and nothing is saved. Sheets keep sized devices."
      actions={
        summary && (
          <Button size="xs" variant="default" leftSection={<IconSend size={14} />} onClick={() => setSending(true)}>
            Send to a sheet…
          </Button>
        )
      }
    />
  );
  if (profiles.isPending) return <>{header}<PageLoader label="Loading the process library" /></>;
  if (profiles.isError) return <>{header}<ErrorPanel title="The process library could not be loaded" message={profiles.error.message} onRetry={() => void profiles.refetch()} /></>;
  if (!summary) return <>{header}<ErrorPanel title="No process profiles yet" message="An administrator or process maintainer adds process profiles to the library first." /></>;
  if (profile.isError) return <>{header}<ErrorPanel title="The process could not be loaded" message={profile.error.message} onRetry={() => void profile.refetch()} /></>;
  if (!profile.data) return <>{header}<PageLoader label="Loading the process" /></>;

  return (
    <>
      {header}
      <DeviceWorkbench
        values={values}
        onChange={setField}
        process={profile.data.version.definition}
        processRef={{ processId: summary.id, processVersion: version ?? summary.latestVersion }}
        formHeader={<ProcessPicker profiles={available} value={summary.id} version={version} onChange={setChosenId} />}
        charts={charts}
      />
      {/* Mounted only while open: its project and sheet lists are fetched when the designer asks to send. */}
      {sending && <SendToSheetDialog opened onClose={() => setSending(false)} values={values} processRef={{ processId: summary.id, processVersion: version ?? summary.latestVersion }} processName={summary.name} />}
    </>
  );
}
