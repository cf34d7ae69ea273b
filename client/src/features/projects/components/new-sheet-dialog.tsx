import { createSheetRequestSchema, fieldOfIssue, type CreateSheetRequestInput } from '@channelwright/shared/schemas';
import { parseQuantity } from '@channelwright/shared/units';
import { Group, Modal, SegmentedControl, Select, Stack, TextInput, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useNavigate } from 'react-router-dom';
import { DialogActions } from '../../../components/dialog-actions';
import { ProcessSummaryLine } from '../../../components/process-summary-line';
import { QuantityInput } from '../../../components/quantity-input';
import { ServerErrorAlert } from '../../../components/server-error-alert';
import { isApiError } from '../../../lib/api-error';
import { currentTables, useProcessTables } from '../../../lib/characterisation/process-tables';
import { useProcessProfiles } from '../../../lib/processes/process-profiles';
import { useCreateSheet } from '../api/create-sheet';

interface NewSheetValues {
  name: string;
  description: string;
  processId: string;
  processVersion: string;
  corner: string;
  temperature: string;
  model: 'all-region' | 'square-law' | 'table';
}

const ANALYTIC = [
  { value: 'all-region', label: 'All-region' },
  { value: 'square-law', label: 'Square law' },
];
const TABLE = { value: 'table', label: 'Tables' };

function toRequest(values: NewSheetValues): { request?: CreateSheetRequestInput; errors: Record<string, string> } {
  const temperature = values.temperature.trim() === '' ? null : parseQuantity(values.temperature, '°C');
  if (temperature && !temperature.ok) return { errors: { temperature: temperature.reason } };
  const request: CreateSheetRequestInput = {
    name: values.name,
    description: values.description,
    processId: values.processId,
    processVersion: Number(values.processVersion),
    corner: values.corner,
    model: values.model,
    temperature: temperature ? temperature.value : null,
  };
  const checked = createSheetRequestSchema.safeParse(request);
  if (checked.success) return { request, errors: {} };
  return { errors: Object.fromEntries(checked.error.issues.map((issue) => [fieldOfIssue(issue) ?? 'name', issue.message])) };
}

/** A new sheet of the project on a chosen process profile version, with its default conditions. */
export function NewSheetDialog({ projectId, opened, onClose }: { projectId: string; opened: boolean; onClose: () => void }) {
  const navigate = useNavigate();
  const profiles = useProcessProfiles();
  const create = useCreateSheet();
  const available = profiles.data?.filter((p) => !p.deprecated) ?? [];
  const form = useForm<NewSheetValues>({
    mode: 'controlled',
    initialValues: { name: '', description: '', processId: '', processVersion: '', corner: 'TT', temperature: '', model: 'all-region' },
  });
  const profile = available.find((p) => p.id === form.values.processId);
  const chooseProfile = (id: string | null) => {
    const chosen = available.find((p) => p.id === id);
    form.setValues({ processId: id ?? '', processVersion: chosen ? String(chosen.latestVersion) : '', corner: 'TT' });
  };
  const submit = form.onSubmit((values) => {
    const { request, errors } = toRequest(values);
    if (!request) {
      form.setErrors(errors);
      return;
    }
    create.mutate(
      { projectId, request },
      {
        onSuccess: (sheet) => void navigate(`/sheets/${sheet.id}`),
        onError: (error) => {
          if (isApiError(error) && error.field) form.setFieldError(error.field, error.message);
        },
      },
    );
  });
  // The table model is on offer once the chosen version has tables characterised from its model card.
  const tables = useProcessTables(form.values.processId || undefined, Number(form.values.processVersion) || undefined);
  const models = currentTables(tables.data).length > 0 || form.values.model === 'table' ? [...ANALYTIC, TABLE] : ANALYTIC;
  const versions = profile ? Array.from({ length: profile.latestVersion }, (_, i) => profile.latestVersion - i) : [];

  return (
    <Modal opened={opened} onClose={onClose} title="New sheet" size="lg">
      <form onSubmit={submit} noValidate aria-label="New sheet">
        <Stack gap="sm">
          <ServerErrorAlert title="The sheet was not created" error={isApiError(create.error) && create.error.field ? null : create.error} />
          <TextInput label="Name" withAsterisk placeholder="Two-stage amplifier" {...form.getInputProps('name')} />
          <Textarea label="Description" rows={2} {...form.getInputProps('description')} />
          <Group grow align="flex-start" gap="sm">
            <Select
              label="Process profile"
              withAsterisk
              placeholder={profiles.isPending ? 'Loading the library…' : 'Choose a profile'}
              data={available.map((p) => ({ value: p.id, label: p.name }))}
              {...form.getInputProps('processId')}
              onChange={chooseProfile}
            />
            <Select
              label="Version"
              disabled={!profile}
              data={versions.map((v) => ({ value: String(v), label: v === profile?.latestVersion ? `v${v} (latest)` : `v${v}` }))}
              allowDeselect={false}
              {...form.getInputProps('processVersion')}
            />
          </Group>
          {profile && <ProcessSummaryLine profile={profile} />}
          <Group grow align="flex-start" gap="sm">
            <Select label="Default corner" data={profile?.corners ?? ['TT']} allowDeselect={false} {...form.getInputProps('corner')} />
            <QuantityInput
              label="Default temperature"
              unit="°C"
              placeholder={profile ? `${profile.tnom} (tnom)` : 'tnom'}
              value={form.values.temperature}
              onChange={(text) => form.setFieldValue('temperature', text)}
              error={form.errors.temperature}
            />
          </Group>
          <SegmentedControl aria-label="Default current model" data={models} {...form.getInputProps('model')} />
          <DialogActions onCancel={onClose} submitLabel="Create sheet" pending={create.isPending} />
        </Stack>
      </form>
    </Modal>
  );
}
