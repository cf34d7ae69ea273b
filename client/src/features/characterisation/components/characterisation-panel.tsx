import type { ProcessProfile } from '@channelwright/shared/schemas';
import { formatQuantity } from '@channelwright/shared/units';
import { Alert, Anchor, Button, Group, Stack, Text } from '@mantine/core';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { PageLoader } from '../../../components/page-loader';
import { characterisationKeys } from '../../../lib/characterisation/characterisation-keys';
import { byDevice, useProcessTables } from '../../../lib/characterisation/process-tables';
import { useCancelCharacterisation } from '../api/cancel-characterisation';
import { useCharacterisations } from '../api/get-characterisations';
import { useStartCharacterisation } from '../api/start-characterisation';
import { defaultGridPreview, deviceLabel } from '../model/grid-preview';
import { isUnderway } from '../model/job-status';
import { GridTable, type GridRow } from './grid-table';
import { JobProgress } from './job-progress';

interface CharacterisationPanelProps {
  profile: ProcessProfile;
  /** Maintainers start and cancel characterisations; everyone else follows them. */
  maintainer: boolean;
}

function StartCharacterisation({ profile, doneTotal }: { profile: ProcessProfile; doneTotal: number | null }) {
  const { id, version } = { id: profile.id, version: profile.version.number };
  const card = profile.version.modelCard;
  const [open, setOpen] = useState(false);
  const start = useStartCharacterisation(id, version);
  const preview = useMemo(() => (card ? defaultGridPreview(profile.version.definition, card.mapping) : []), [profile, card]);
  const total = preview.reduce((sum, device) => sum + device.points, 0);
  // The same version and grid are characterised once: the default grid done already has nothing to start.
  if (doneTotal === total) {
    return (
      <Text size="xs" c="dimmed">
        Characterised over the default grid. A new card (a new version) is characterised anew.
      </Text>
    );
  }
  return (
    <Stack gap="xs">
      <Group gap="xs">
        <Button size="sm" onClick={() => setOpen((o) => !o)} variant={open ? 'default' : 'filled'}>
          {open ? 'Hide the grid' : 'Characterise…'}
        </Button>
        {open && (
          <Button size="sm" loading={start.isPending} onClick={() => start.mutate({ processId: id, version })}>
            Start with the default grid ({total.toLocaleString('en')} points)
          </Button>
        )}
      </Group>
      {open && (
        <Stack gap={4}>
          <Text size="xs" c="dimmed">
            Every mapped device is simulated in ngspice over this grid at a reference width of {formatQuantity(preview[0]?.grid.referenceWidth ?? 10e-6, 'm')}; PMOS
            voltages are VSG, VSD and VBS. The server checks the grid again when it starts.
          </Text>
          <GridTable caption="Default grid" rows={preview.map((d) => ({ key: d.label, ...d }))} />
        </Stack>
      )}
      {start.error && (
        <Alert color="red" variant="light" title="The characterisation was not started">
          {start.error.message}
        </Alert>
      )}
    </Stack>
  );
}

/** A version's characterisations: the newest job with its progress, starting and cancelling one, and the stored tables. */
export function CharacterisationPanel({ profile, maintainer }: CharacterisationPanelProps) {
  const { id } = profile;
  const version = profile.version.number;
  const jobs = useCharacterisations(id, version);
  const tables = useProcessTables(id, version);
  const cancel = useCancelCharacterisation(id, version);
  const queryClient = useQueryClient();
  const latest = jobs.data?.[0];
  // A job that has just finished brings new tables (and makes the table model available).
  useEffect(() => {
    if (latest?.status === 'done') void queryClient.invalidateQueries({ queryKey: characterisationKeys.tables(id, version) });
  }, [latest?.id, latest?.status, id, version, queryClient]);

  if (!profile.version.modelCard) {
    return (
      <Text size="sm" c="dimmed">
        This version has no model card, so there is nothing to characterise. {maintainer ? 'Upload a card as a new version above.' : ''}
      </Text>
    );
  }
  if (jobs.isPending) return <PageLoader label="Loading the characterisations" />;
  if (jobs.isError) return <Alert color="red" variant="light" title="The characterisations could not be loaded">{jobs.error.message}</Alert>;

  const underway = latest !== undefined && isUnderway(latest.status);
  const rows: GridRow[] = [...(tables.data ?? [])].sort((a, b) => Number(b.current) - Number(a.current) || byDevice(a, b)).map((table) => ({
    key: table.id,
    label: deviceLabel(table.polarity, table.flavour),
    model: table.model,
    grid: table.grid,
    points: table.points,
    note: table.current ? (
      <Text size="xs" c="teal" fw={600} style={{ whiteSpace: 'nowrap' }}>
        in use
      </Text>
    ) : (
      <Text size="xs" c="dimmed">
        older
      </Text>
    ),
  }));

  return (
    <Stack gap="md">
      {latest ? (
        <JobProgress job={latest} onCancel={maintainer ? () => cancel.mutate(latest.id) : undefined} cancelling={cancel.isPending} />
      ) : (
        <Text size="sm" c="dimmed">
          This version has not been characterised yet.
        </Text>
      )}
      {maintainer && !underway && <StartCharacterisation profile={profile} doneTotal={latest?.status === 'done' ? latest.progress.total : null} />}
      {rows.length > 0 && (
        <Stack gap={4}>
          <Group justify="space-between">
            <Text size="sm" fw={600}>
              Tables of v{version}
            </Text>
            <Anchor component={Link} to={`/processes/${encodeURIComponent(id)}/design-charts?version=${version}`} size="sm">
              Open the gm/ID design charts
            </Anchor>
          </Group>
          <GridTable caption="Characterised tables" rows={rows} noteHeader="Sizing" />
        </Stack>
      )}
    </Stack>
  );
}
