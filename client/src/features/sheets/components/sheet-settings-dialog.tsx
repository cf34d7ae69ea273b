import { MODEL_LABELS, MODELS, type Sheet } from '@channelwright/shared/schemas';
import { Alert, Button, Divider, Group, Modal, Select, SimpleGrid, Stack, Text, TextInput, Textarea, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { IconTrash } from '@tabler/icons-react';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { QuantityInput } from '../../../components/quantity-input';
import { useProcessProfiles } from '../../../lib/processes/process-profiles';
import { useDeleteSheet } from '../api/delete-sheet';
import { useUpdateSheet } from '../api/update-sheet';
import { settingsChange, settingsOf, type SettingsErrors, type SettingsValues } from '../model/settings-form';

/** The sheet's own settings: name, process version, defaults, budgets; and its deletion (refused while it has revisions). */
export function SheetSettingsDialog({ sheet, opened, onClose }: { sheet: Sheet; opened: boolean; onClose: () => void }) {
  const form = useForm<SettingsValues>({ mode: 'controlled', initialValues: settingsOf(sheet) });
  const [errors, setErrors] = useState<SettingsErrors>({});
  const profiles = useProcessProfiles();
  const update = useUpdateSheet(sheet.id);
  const remove = useDeleteSheet();
  const navigate = useNavigate();
  const [confirmDelete, setConfirmDelete] = useState(false);
  const values = form.values;
  const chosen = profiles.data?.find((p) => p.id === values.processId);
  const versions = Array.from({ length: chosen?.latestVersion ?? sheet.process.latestVersion }, (_, i) => String(i + 1)).reverse();
  const corners = chosen?.id === sheet.process.profileId ? sheet.process.corners : (chosen?.corners ?? sheet.process.corners);

  const close = () => {
    form.setValues(settingsOf(sheet));
    setErrors({});
    update.reset();
    remove.reset();
    setConfirmDelete(false);
    onClose();
  };
  const save = () => {
    const { change, errors: found } = settingsChange(sheet, values);
    setErrors(found);
    if (!change) {
      if (Object.keys(found).length === 0) close();
      return;
    }
    update.mutate(change, {
      onSuccess: (saved) => {
        const stale = saved.devices.filter((d) => d.stale).map((d) => d.targets.name);
        notifications.show({ color: 'channel', message: stale.length > 0 && saved.process.versionId !== sheet.process.versionId ? `Moved to ${saved.process.name} v${saved.process.version}: ${stale.join(', ')} ${stale.length === 1 ? 'is' : 'are'} stale until you recompute.` : 'Sheet settings saved' });
        form.setValues(settingsOf(saved));
        onClose();
      },
    });
  };
  const del = () =>
    remove.mutate(
      { sheetId: sheet.id, version: sheet.version, projectId: sheet.projectId },
      {
        onSuccess: () => {
          notifications.show({ color: 'channel', message: `${sheet.name} deleted` });
          void navigate(`/projects/${sheet.projectId}`, { replace: true });
        },
      },
    );
  const text = (field: 'name', label: string) => <TextInput label={label} size="xs" {...form.getInputProps(field)} error={errors[field]} />;

  return (
    <Modal opened={opened} onClose={close} title="Sheet settings" size="lg">
      <Stack gap="sm">
        {text('name', 'Name')}
        <Textarea label="Description" size="xs" autosize minRows={2} {...form.getInputProps('description')} error={errors.description} />
        <SimpleGrid cols={2} spacing="xs">
          <Select label="Process" size="xs" data={(profiles.data ?? []).map((p) => ({ value: p.id, label: p.name }))} value={values.processId} onChange={(id) => {
            const profile = profiles.data?.find((p) => p.id === id);
            if (!profile) return;
            form.setFieldValue('processId', profile.id);
            form.setFieldValue('processVersion', String(profile.latestVersion));
            if (!profile.corners.includes(values.corner)) form.setFieldValue('corner', 'TT');
          }} allowDeselect={false} error={errors.processId} />
          <Select label="Version" size="xs" data={versions} value={values.processVersion} onChange={(v) => v && form.setFieldValue('processVersion', v)} allowDeselect={false} error={errors.processVersion} />
          <Select label="Default corner" size="xs" data={corners} value={values.corner} onChange={(v) => v && form.setFieldValue('corner', v)} allowDeselect={false} error={errors.corner} />
          <QuantityInput label="Default temperature" unit="°C" size="xs" placeholder={`tnom (${sheet.process.tnom})`} value={values.temperature} onChange={(t) => form.setFieldValue('temperature', t)} error={errors.temperature} />
          <Select label="Default model" size="xs" data={MODELS.map((m) => ({ value: m, label: MODEL_LABELS[m] }))} value={values.model} onChange={(v) => v && form.setFieldValue('model', v as SettingsValues['model'])} allowDeselect={false} />
        </SimpleGrid>
        {values.processId !== sheet.process.profileId || values.processVersion !== String(sheet.process.version) ? (
          <Text size="xs" c="oxide">Every stored result stays until you recompute; the sheet lists the devices that are then stale.</Text>
        ) : null}
        <Divider label="Budgets" labelPosition="left" />
        <SimpleGrid cols={2} spacing="xs">
          <QuantityInput label="Leakage budget" unit="A" size="xs" placeholder="50n" value={values.leakageBudget} onChange={(t) => form.setFieldValue('leakageBudget', t)} error={errors.leakageBudget} />
          <QuantityInput label="At temperature" unit="°C" size="xs" placeholder="125" value={values.leakageTemperature} onChange={(t) => form.setFieldValue('leakageTemperature', t)} error={errors.leakageTemperature} />
          {Object.keys(values.offsetBudgets).map((group) => (
            <QuantityInput key={group} label={`σ(VOS) budget, ${group}`} unit="V" size="xs" placeholder="2m" value={values.offsetBudgets[group]} onChange={(t) => form.setFieldValue(`offsetBudgets.${group}`, t)} error={errors[`offsetBudgets.${group}`]} />
          ))}
        </SimpleGrid>
        {update.error && <Alert color="red" variant="light" title="Not saved" role="alert">{update.error.message}</Alert>}
        <Group justify="flex-end" gap="xs">
          <Button variant="default" size="xs" onClick={close}>Cancel</Button>
          <Button size="xs" onClick={save} loading={update.isPending}>Save settings</Button>
        </Group>
        <Divider />
        <Stack gap={6}>
          <Title order={3} fz="sm">Delete the sheet</Title>
          {remove.error ? (
            <Alert color="red" variant="light" title="Not deleted" role="alert">{remove.error.message}</Alert>
          ) : (
            <Text size="xs" c="dimmed">Deletes the sheet and its devices. A sheet with frozen revisions is kept for the record and cannot be deleted.</Text>
          )}
          <Group gap="xs">
            {confirmDelete ? (
              <>
                <Button size="xs" color="red" leftSection={<IconTrash size={14} />} loading={remove.isPending} onClick={del}>Delete {sheet.name} for good</Button>
                <Button size="xs" variant="default" onClick={() => setConfirmDelete(false)}>Keep it</Button>
              </>
            ) : (
              <Button size="xs" color="red" variant="light" leftSection={<IconTrash size={14} />} onClick={() => setConfirmDelete(true)}>Delete this sheet…</Button>
            )}
          </Group>
        </Stack>
      </Stack>
    </Modal>
  );
}
