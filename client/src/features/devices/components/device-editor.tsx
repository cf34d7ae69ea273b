import type { Device, Process, Sheet } from '@channelwright/shared/schemas';
import { Alert, Button, Group, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { IconDeviceFloppy } from '@tabler/icons-react';
import { useMemo, useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { useSaveDevice } from '../hooks/use-save-device';
import { buildDeviceTargets, deviceChanges, valuesOfDevice, type DetailErrors, type DeviceDetails } from '../model/device-form';
import type { SizedDeviceView } from '../model/sized-device';
import { buildSizeRequest, type FieldErrors } from '../model/size-request';
import type { TargetsValues } from '../model/targets';
import { DeviceDetailsFields } from './device-details-fields';
import { DeviceWorkbench } from './device-workbench';
import { LimitsFields } from './limits-fields';
import { StaleEditAlert } from './stale-edit-alert';
import { useUnsavedChangesGuard } from '../hooks/use-unsaved-changes-guard';

interface DeviceEditorProps {
  sheet: Sheet;
  process: Process;
  /** Absent for a new device. */
  device?: Device;
  initial: { targets: TargetsValues; details: DeviceDetails };
  editable: boolean;
  /** Reads the stored device again (after a conflict). */
  reloadStored: () => Promise<Device | undefined>;
  /** Drawn under the results (the design charts). */
  charts?: SizedDeviceView;
}

type Values = TargetsValues & { details: DeviceDetails };

/** The device page's form bound to a stored (or new) device of a sheet: live sizing, then save. */
export function DeviceEditor({ sheet, process, device, initial, editable, reloadStored, charts }: DeviceEditorProps) {
  const navigate = useNavigate();
  const form = useForm<Values>({ mode: 'controlled', initialValues: { ...initial.targets, details: initial.details } });
  const [version, setVersion] = useState(device?.version ?? 0);
  const [saveErrors, setSaveErrors] = useState<FieldErrors & DetailErrors>({});
  const processRef = useMemo(() => ({ processId: sheet.process.profileId, processVersion: sheet.process.version }), [sheet.process.profileId, sheet.process.version]);
  const defaults = useMemo(() => ({ corner: sheet.corner, temperature: sheet.temperature }), [sheet.corner, sheet.temperature]);

  const { details, ...targets } = form.values;
  const reset = (stored: Device) => {
    const next = valuesOfDevice(stored, sheet);
    const values = { ...next.targets, details: next.details };
    form.setValues(values);
    form.resetDirty(values);
    setVersion(stored.version);
  };
  const guard = useUnsavedChangesGuard({ dirty: editable && form.isDirty(), what: device ? device.targets.name : 'this new device' });
  const saver = useSaveDevice(sheet.id, device?.id, (saved) => {
    notifications.show({ color: 'channel', message: `${saved.targets.name} saved${saved.result ? '' : ', but the engine could not size it'}` });
    if (!device) {
      guard.allow();
      void navigate(`/sheets/${sheet.id}/devices/${saved.id}`, { replace: true });
    } else reset(saved);
  });

  const submit = (againstVersion = version) => {
    const built = buildSizeRequest(targets, processRef, defaults);
    if (!built.request) {
      setSaveErrors({ ...built.errors, ...Object.fromEntries(built.missing.map((field) => [field, 'Needed to size the device'])) });
      return;
    }
    const stored = buildDeviceTargets(built.request, targets, details);
    if (!stored.ok) {
      setSaveErrors(stored.errors);
      return;
    }
    setSaveErrors({});
    const dirty = (field: string) => form.isDirty(field);
    saver.save({ targets: stored.targets, changes: device ? deviceChanges(stored.targets, dirty, againstVersion) : undefined });
  };
  const loadTheirs = async () => {
    const stored = await reloadStored();
    saver.clear();
    if (stored) reset(stored);
  };
  const saveMine = async () => {
    const stored = await reloadStored();
    if (stored) {
      setVersion(stored.version);
      submit(stored.version);
    }
  };

  const refusalField = saver.outcome.kind === 'refused' ? saver.outcome.field : undefined;
  const errors = { ...saveErrors, ...(refusalField && saver.outcome.kind === 'refused' ? { [refusalField]: saver.outcome.message } : {}) };
  const setTarget = <K extends keyof TargetsValues>(field: K, value: TargetsValues[K]) => form.setFieldValue(field, value as never);
  const setDetail = <K extends keyof DeviceDetails>(field: K, value: DeviceDetails[K]) => form.setFieldValue(`details.${field}`, value as never);

  const footer = (
    <Stack gap="xs">
      <DeviceDetailsFields part="circuit" values={details} onChange={setDetail} errors={errors} readOnly={!editable} />
      <LimitsFields limits={details.limits} polarity={targets.polarity} onChange={(limits) => setDetail('limits', limits)} errors={errors} readOnly={!editable} />
      {saver.outcome.kind === 'conflict' && <StaleEditAlert onLoadTheirs={() => void loadTheirs()} onSaveMine={() => void saveMine()} saving={saver.saving} />}
      {saver.outcome.kind === 'refused' && !refusalField && (
        <Alert color="red" variant="light" title="Not saved" role="alert">
          <Text size="xs">{saver.outcome.message}</Text>
        </Alert>
      )}
      {editable ? (
        <Group justify="space-between" align="center">
          <Text size="xs" c="dimmed">
            {device ? (form.isDirty() ? 'Unsaved changes' : `Saved as version ${version}`) : 'Not saved yet'}
          </Text>
          <Button size="xs" leftSection={<IconDeviceFloppy size={14} />} loading={saver.saving} onClick={() => submit()}>
            {device ? 'Save' : 'Save to the sheet'}
          </Button>
        </Group>
      ) : (
        <Text size="xs" c="dimmed">
          You can read this device; designers and owners of the project edit it.
        </Text>
      )}
    </Stack>
  );

  return (
    <>
      {guard.dialog}
      <DeviceWorkbench
        values={targets}
        onChange={setTarget}
        process={process}
        processRef={processRef}
        defaults={defaults}
        readOnly={!editable}
        extraErrors={errors}
        formHeader={<DeviceDetailsFields part="identity" values={details} onChange={setDetail} errors={errors} readOnly={!editable} />}
        formFooter={footer}
        charts={charts}
      />
    </>
  );
}
