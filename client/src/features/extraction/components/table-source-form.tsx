import { type CharacterisationTable, type ExtractionFromTableRequestInput, extractionFromTableRequestSchema, type Extraction } from '@channelwright/shared/schemas';
import { formatQuantity } from '@channelwright/shared/units';
import { Alert, Button, Chip, Group, Select, SimpleGrid, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { isApiError } from '../../../lib/api-error';
import { currentTables, useProcessTables } from '../../../lib/characterisation/process-tables';
import { useProcessProfiles } from '../../../lib/processes/process-profiles';
import { useCreateExtractionFromTable } from '../api/create-extraction-from-table';
import { FitModelControl } from './fit-model-control';

const deviceKey = (table: Pick<CharacterisationTable, 'polarity' | 'flavour'>) => `${table.polarity}/${table.flavour ?? ''}`;
const deviceLabel = (table: CharacterisationTable) => `${table.polarity.toUpperCase()}${table.flavour ? ` ${table.flavour}` : ''} (${table.model})`;

/**
 * The characterised table to fit to: a profile version with tables, one of its devices (polarity and flavour), a
 * corner of that table and optionally fewer of its lengths (every one when none is chosen), and the model. The server
 * keeps the table's points as an upload naming the table, so the run, the result and the save are those of an upload.
 */
interface FormValues {
  processId: string;
  version: string;
  /** deviceKey of the chosen table. */
  device: string;
  corner: string;
  /** Chosen lengths as the table lists them (m, as text); none: every length. */
  lengths: string[];
  model: 'all-region' | 'square-law';
}

/** The request the form's values make with the chosen table (undefined before one is chosen). */
function toRequest(values: FormValues, table: CharacterisationTable | undefined): ExtractionFromTableRequestInput {
  return {
    processId: values.processId,
    version: Number(values.version) || undefined,
    polarity: table?.polarity ?? 'nmos',
    flavour: table?.flavour ?? null,
    corner: values.corner,
    lengths: values.lengths.length > 0 ? values.lengths.map(Number).sort((a, b) => a - b) : undefined,
    model: values.model,
  };
}

export function TableSourceForm({ onStarted }: { onStarted: (extraction: Extraction) => void }) {
  const profiles = useProcessProfiles();
  const create = useCreateExtractionFromTable();
  const form = useForm<FormValues>({ initialValues: { processId: '', version: '', device: '', corner: '', lengths: [], model: 'all-region' } });
  const { processId, version, device } = form.values;
  const profile = profiles.data?.find((p) => p.id === processId);
  const tables = useProcessTables(processId || undefined, Number(version) || undefined);
  const devices = currentTables(tables.data);
  const table = devices.find((t) => deviceKey(t) === device);
  const versions = profile ? Array.from({ length: profile.latestVersion }, (_, i) => String(profile.latestVersion - i)) : [];
  const refused = isApiError(create.error) ? create.error : null;
  const errorOf = (field: string) => form.errors[field === 'polarity' ? 'device' : field] ?? (refused?.field === field ? refused.message : undefined);

  const chooseTable = (next: CharacterisationTable | undefined) => form.setValues({ device: next ? deviceKey(next) : '', corner: next?.grid.corners[0] ?? '', lengths: [] });
  const chooseVersion = (next: string) => {
    form.setFieldValue('version', next);
    chooseTable(undefined);
  };

  const submit = form.onSubmit((values) => {
    create.reset();
    const request = toRequest(values, table);
    const parsed = extractionFromTableRequestSchema.safeParse(request);
    const found: Record<string, string> = {};
    if (!values.processId) found.processId = 'Choose the profile whose tables to fit';
    else if (!table) found.device = 'Choose a characterised device';
    if (!parsed.success) for (const issue of parsed.error.issues) found[String(issue.path[0])] ??= issue.message;
    form.setErrors(found);
    if (Object.keys(found).length === 0) create.mutate(request, { onSuccess: onStarted });
  });

  const noTables = Boolean(version) && tables.isSuccess && devices.length === 0;
  return (
    <form onSubmit={submit} aria-label="Table to fit" noValidate>
      <Stack gap="md">
        <SimpleGrid cols={{ base: 1, sm: 3 }}>
          <Select
            label="Profile"
            description="Everything not fitted comes from the chosen version"
            placeholder={profiles.isPending ? 'Loading…' : 'Choose a profile'}
            data={(profiles.data ?? []).map((p) => ({ value: p.id, label: p.name }))}
            searchable
            value={processId || null}
            onChange={(id) => {
              form.setFieldValue('processId', id ?? '');
              const chosen = profiles.data?.find((p) => p.id === id);
              chooseVersion(chosen ? String(chosen.latestVersion) : '');
            }}
            error={errorOf('processId')}
          />
          <Select
            label="Version"
            disabled={!profile}
            data={versions.map((v) => ({ value: v, label: Number(v) === profile?.latestVersion ? `v${v} (latest)` : `v${v}` }))}
            allowDeselect={false}
            value={version || null}
            onChange={(v) => chooseVersion(v ?? '')}
            error={errorOf('version')}
          />
          <Select
            label="Device"
            description="The version's current table of each device"
            disabled={devices.length === 0}
            placeholder={tables.isFetching ? 'Loading the tables…' : devices.length === 0 ? 'No tables' : 'Choose a device'}
            data={devices.map((t) => ({ value: deviceKey(t), label: deviceLabel(t) }))}
            allowDeselect={false}
            value={device || null}
            onChange={(key) => chooseTable(devices.find((t) => deviceKey(t) === key))}
            error={errorOf('polarity')}
          />
        </SimpleGrid>
        {noTables && (
          <Text size="sm" c="dimmed" role="status">
            Version {version} of {profile?.name} has no characterised tables: a maintainer characterises its model card first.
          </Text>
        )}
        {table && (
          <SimpleGrid cols={{ base: 1, sm: 3 }}>
            <Select label="Corner" data={table.grid.corners} allowDeselect={false} {...form.getInputProps('corner')} error={errorOf('corner')} />
            <Stack gap={4}>
              <Text size="sm" fw={500} id="table-lengths">
                Lengths (every one when none is chosen)
              </Text>
              <Chip.Group multiple value={form.values.lengths} onChange={(chosen) => form.setFieldValue('lengths', chosen)}>
                <Group gap={6} role="group" aria-labelledby="table-lengths">
                  {table.grid.lengths.map((l) => (
                    <Chip key={l} value={String(l)} size="xs">
                      {formatQuantity(l, 'm')}
                    </Chip>
                  ))}
                </Group>
              </Chip.Group>
              {errorOf('lengths') && (
                <Text size="xs" c="red" role="alert">
                  {errorOf('lengths')}
                </Text>
              )}
            </Stack>
            <FitModelControl id="table-model" {...form.getInputProps('model')} />
          </SimpleGrid>
        )}
        {table && (
          <Text size="xs" c="dimmed">
            {table.points.toLocaleString('en')} points in the table; W = {formatQuantity(table.grid.referenceWidth, 'm')} (its reference width); VDS {table.grid.vds.map((v) => formatQuantity(v, 'V')).join(', ')}; VSB{' '}
            {table.grid.vsb.map((v) => formatQuantity(v, 'V')).join(', ')}; {table.grid.temperatures.map((v) => formatQuantity(v, '°C')).join(', ')}. SHA-256 {table.sha256.slice(0, 12)}…
          </Text>
        )}
        <Group>
          <Button type="submit" loading={create.isPending}>
            Fit to the table
          </Button>
        </Group>
        {create.error && !['processId', 'version', 'polarity', 'corner', 'lengths'].includes(refused?.field ?? '') && (
          <Alert color="red" variant="light" title="Not started">
            {create.error.message}
          </Alert>
        )}
      </Stack>
    </form>
  );
}
