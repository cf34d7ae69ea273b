import { Alert, Button, Group, Modal, Select, Stack, Text, TextInput } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { isApiError } from '../../../lib/api-error';
import { canEditSheets } from '../../../lib/projects/project-permissions';
import { useProjects } from '../../../lib/projects/projects';
import { useProjectSheets } from '../../../lib/sheets/project-sheets';
import { useSheet } from '../../../lib/sheets/sheet';
import { useCreateDevice } from '../api/create-device';
import { buildDeviceTargets } from '../model/device-form';
import { nextDeviceName } from '../model/device-names';
import { buildSizeRequest, type ProcessRef } from '../model/size-request';
import type { TargetsValues } from '../model/targets';

interface SendToSheetDialogProps {
  opened: boolean;
  onClose: () => void;
  values: TargetsValues;
  processRef: ProcessRef;
  processName: string;
}

/** Sends the device sized on the scratch page to a sheet the designer may edit, under a name free there. */
export function SendToSheetDialog({ opened, onClose, values, processRef, processName }: SendToSheetDialogProps) {
  const projects = useProjects();
  const editable = (projects.data ?? []).filter(canEditSheets);
  const [projectId, setProjectId] = useState<string | null>(null);
  const [sheetId, setSheetId] = useState<string | null>(null);
  const [name, setName] = useState('');
  const sheets = useProjectSheets(projectId ?? '');
  const sheet = useSheet(sheetId ?? '');
  const create = useCreateDevice();
  const free = sheet.data ? nextDeviceName(sheet.data.devices.map((d) => d.targets.name)) : 'M1';
  const chosen = sheets.data?.find((s) => s.id === sheetId);
  const send = () => {
    if (!sheetId) return;
    const built = buildSizeRequest(values, processRef);
    if (!built.request) return;
    const stored = buildDeviceTargets(built.request, values, { name: name.trim() || free, function: '', matchGroup: '', multiplier: '1', supplyBranch: false, notes: `Sized on the scratch page on ${processName}.`, limits: [] });
    if (!stored.ok) return;
    create.mutate(
      { sheetId, targets: stored.targets, quiet: true },
      {
        onSuccess: (device) => {
          notifications.show({ color: 'channel', message: <>{device.targets.name} added to <Link to={`/sheets/${sheetId}/devices/${device.id}`}>{chosen?.name ?? 'the sheet'}</Link></> });
          onClose();
        },
      },
    );
  };
  const ready = buildSizeRequest(values, processRef).request !== null;
  const nameError = isApiError(create.error) && create.error.field === 'name' ? create.error.message : undefined;
  return (
    <Modal opened={opened} onClose={onClose} title="Send this device to a sheet">
      <Stack gap="sm">
        {!ready && <Text size="sm" c="red">Fill in the targets first: they are what the sheet stores.</Text>}
        <Select label="Project" size="xs" data={editable.map((p) => ({ value: p.id, label: p.name }))} value={projectId} onChange={(id) => { setProjectId(id); setSheetId(null); }} placeholder={editable.length ? 'Choose a project' : 'No project you may edit'} />
        <Select label="Sheet" size="xs" data={(sheets.data ?? []).map((s) => ({ value: s.id, label: `${s.name} (${s.process.name})` }))} value={sheetId} onChange={setSheetId} disabled={!projectId} placeholder="Choose a sheet" />
        <TextInput label="Name on the sheet" size="xs" placeholder={free} value={name} onChange={(e) => setName(e.currentTarget.value)} error={nameError} />
        {chosen && chosen.process.profileId !== processRef.processId && (
          <Text size="xs" c="oxide">The sheet is on {chosen.process.name}, not {processName}: the device keeps its targets and is sized there.</Text>
        )}
        {create.error && !nameError && <Alert color="red" variant="light" title="Not added" role="alert">{create.error.message}</Alert>}
        <Group justify="flex-end" gap="xs">
          <Button variant="default" size="xs" onClick={onClose}>Cancel</Button>
          <Button size="xs" disabled={!ready || !sheetId} loading={create.isPending} onClick={send}>Add to the sheet</Button>
        </Group>
      </Stack>
    </Modal>
  );
}
