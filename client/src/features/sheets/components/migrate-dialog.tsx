import type { Sheet, SheetMigration } from '@channelwright/shared/schemas';
import { Anchor, Button, Group, Modal, MultiSelect, Select, Stack, Switch, Text, TextInput } from '@mantine/core';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { useProcessProfiles } from '../../../lib/processes/process-profiles';
import { useMigrateSheet } from '../api/migrate-sheet';
import { MigrationTable } from './migration-table';

/** "Migrate this sheet": pick another process, see every device re-solved there beside the old one, then create the new sheet. */
export function MigrateDialog({ sheet, opened, onClose }: { sheet: Sheet; opened: boolean; onClose: () => void }) {
  const profiles = useProcessProfiles();
  const [processId, setProcessId] = useState<string | null>(null);
  const [name, setName] = useState('');
  const [fixed, setFixed] = useState<string[]>([]);
  const [scaleVoltages, setScaleVoltages] = useState(true);
  const [shown, setShown] = useState<SheetMigration | null>(null);
  const migrate = useMigrateSheet(sheet.id);
  const others = (profiles.data ?? []).filter((p) => p.id !== sheet.process.profileId);
  const target = others.find((p) => p.id === processId);
  const request = (preview: boolean) => ({ processId: processId as string, ...(name.trim() ? { name: name.trim() } : {}), fixedLengths: fixed, scaleVoltages, preview });
  const close = () => {
    setShown(null);
    migrate.reset();
    onClose();
  };
  return (
    <Modal opened={opened} onClose={close} title={`Migrate ${sheet.name} to another process`} size="90%">
      <Stack gap="sm">
        <Text size="xs" c="dimmed">
          Each device keeps its ID and second constraint on the new process; L scales with the ratio of the processes&apos; lmin unless you keep it; VDS, VSB and a VGS target scale with the supplies. The result is a new sheet: this one is not changed.
        </Text>
        <Group gap="sm" align="flex-end" wrap="wrap">
          <Select label="New process" size="xs" w={200} data={others.map((p) => ({ value: p.id, label: `${p.name} v${p.latestVersion}` }))} value={processId} onChange={(v) => { setProcessId(v); setShown(null); }} placeholder="Choose a profile" />
          <TextInput label="Name of the new sheet" size="xs" w={260} placeholder={target ? `${sheet.name} on ${target.name}` : ''} value={name} onChange={(e) => setName(e.currentTarget.value)} />
          <MultiSelect label="Keep L as drawn for" size="xs" w={260} data={sheet.devices.map((d) => ({ value: d.id, label: d.targets.name }))} value={fixed} onChange={(v) => { setFixed(v); setShown(null); }} placeholder="none" clearable />
          <Switch label="Scale voltages with the supply" size="xs" checked={scaleVoltages} onChange={(e) => { setScaleVoltages(e.currentTarget.checked); setShown(null); }} />
          <Button size="xs" variant="light" disabled={!processId} loading={migrate.isPending && !shown} onClick={() => migrate.mutate(request(true), { onSuccess: setShown })}>
            Compare
          </Button>
        </Group>
        {shown && (
          <Stack gap="xs">
            <Text size="sm">
              {shown.from.processName} v{shown.from.version} ({shown.from.vdd} V) → {shown.to.processName} v{shown.to.version} ({shown.to.vdd} V); voltages × {shown.voltageScale.toFixed(3)}.
            </Text>
            <MigrationTable migration={shown} />
            {shown.sheet ? (
              <Text size="sm" role="status">
                Created <Anchor component={Link} to={`/sheets/${shown.sheet.id}`} onClick={close}>{shown.sheet.name}</Anchor>; {sheet.name} is unchanged.
              </Text>
            ) : (
              <Group justify="flex-end">
                <Button size="xs" loading={migrate.isPending} onClick={() => migrate.mutate(request(false), { onSuccess: setShown })}>
                  Create the new sheet
                </Button>
              </Group>
            )}
          </Stack>
        )}
      </Stack>
    </Modal>
  );
}
