import { parameterInfo, type Polarity, type Process } from '@channelwright/shared/schemas';
import { Alert, Button, Fieldset, Group, SimpleGrid, Stack, Text, Textarea, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertTriangle } from '@tabler/icons-react';
import { useEffect, useState } from 'react';
import { isApiError } from '../../../lib/api-error';
import { editableQuantity } from '../utils/display-quantity';
import { checkProcessForm, type ProcessFormValues } from '../utils/process-form-values';
import { CornersFieldset } from './corners-fieldset';
import { DeriveDialog, type DerivedValues } from './derive-dialog';
import { DeviceFieldset } from './device-fieldset';
import { ParameterInput } from './parameter-input';

export interface ProcessEdit {
  definition: Process;
  nodeClass: string;
  message: string;
}

interface ProcessEditorFormProps {
  initialValues: ProcessFormValues;
  /** The version being edited (sent as baseVersion); absent for a new profile. */
  baseVersion?: number;
  pending: boolean;
  /** The server's refusal of the last save. */
  error: unknown;
  onSave: (edit: ProcessEdit) => void;
  onCancel: () => void;
  /** Offered after a 409 STALE_EDIT: start again from the version someone else saved. */
  onReloadLatest?: () => void;
}

const info = (name: string) => parameterInfo(name)!;

/** The editor: @mantine/form over text fields, checked with the shared process schema; the server has the last word. */
export function ProcessEditorForm({ initialValues, baseVersion, pending, error, onSave, onCancel, onReloadLatest }: ProcessEditorFormProps) {
  const [derivingFor, setDerivingFor] = useState<Polarity>();
  const form = useForm<ProcessFormValues>({
    mode: 'uncontrolled',
    initialValues,
    validate: (values) => {
      const result = checkProcessForm(values);
      return result.ok ? {} : result.errors;
    },
  });

  // A field the server refused (400 VALIDATION_FAILED, 409 PROCESS_NAME_TAKEN) shows beside that field.
  // setFieldError is stable across renders (a useCallback inside @mantine/form).
  const { setFieldError } = form;
  useEffect(() => {
    if (isApiError(error) && error.field?.startsWith('definition.')) setFieldError(error.field.slice('definition.'.length), error.message);
  }, [error, setFieldError]);

  const submit = form.onSubmit((values) => {
    const result = checkProcessForm(values);
    if (result.ok) onSave({ definition: result.process, nodeClass: values.nodeClass.trim(), message: values.message.trim() });
  });

  const applyDerived = (polarity: Polarity, values: DerivedValues) => {
    for (const [name, value] of Object.entries(values)) form.setFieldValue(`${polarity}.${name}`, editableQuantity(value, info(name)));
  };

  const quantity = (path: 'tnom' | 'vdd' | 'tempRange.min' | 'tempRange.max', label: string, required = false) => {
    return <ParameterInput key={form.key(path)} info={info(path)} label={label} withAsterisk={required} {...form.getInputProps(path)} />;
  };

  const stale = isApiError(error) && error.code === 'STALE_EDIT';
  const { flavours } = form.getValues();

  return (
    <form onSubmit={submit} noValidate aria-label="Process profile editor">
      <Stack gap="lg">
        {stale && (
          <Alert color="orange" variant="light" icon={<IconAlertTriangle size={18} />} title="Someone saved a newer version">
            <Stack gap="xs" align="flex-start">
              <Text size="sm">{error.message}</Text>
              {onReloadLatest && (
                <Button size="xs" variant="default" onClick={onReloadLatest}>
                  Start again from the latest version (discards the changes here)
                </Button>
              )}
            </Stack>
          </Alert>
        )}
        {error !== null && error !== undefined && !stale && (
          <Alert color="red" variant="light" title="Not saved">
            {error instanceof Error ? error.message : 'The server refused the profile.'}
          </Alert>
        )}
        <Fieldset legend="Profile">
          <SimpleGrid cols={{ base: 1, sm: 2 }}>
            <TextInput label="Name" withAsterisk maxLength={100} key={form.key('name')} {...form.getInputProps('name')} />
            <TextInput label="Node class" placeholder="e.g. 180 nm" maxLength={50} key={form.key('nodeClass')} {...form.getInputProps('nodeClass')} />
          </SimpleGrid>
          <Textarea label="Description" rows={2} maxLength={2000} mt="sm" key={form.key('description')} {...form.getInputProps('description')} />
        </Fieldset>
        <Fieldset legend="Process">
          <SimpleGrid cols={{ base: 1, sm: 2, lg: 4 }}>
            {quantity('tnom', 'Nominal temperature tnom', true)}
            {quantity('vdd', 'Supply VDD', true)}
            {quantity('tempRange.min', 'Lowest temperature of use')}
            {quantity('tempRange.max', 'Highest temperature of use')}
          </SimpleGrid>
          <Text size="xs" c="dimmed" mt="xs">
            Numbers accept SI prefixes and units: 310u, 310 µA/V², 0.31m. PMOS voltages are polarity-normalised (VSG, VSD; vt0 = −VTP).
          </Text>
        </Fieldset>
        <SimpleGrid cols={{ base: 1, lg: 2 }}>
          <DeviceFieldset form={form} polarity="nmos" onDerive={() => setDerivingFor('nmos')} />
          <DeviceFieldset form={form} polarity="pmos" onDerive={() => setDerivingFor('pmos')} />
        </SimpleGrid>
        <CornersFieldset form={form} />
        {flavours.length > 0 && (
          <Text size="sm" c="dimmed">
            Flavours ({flavours.map((f) => f.name).join(', ')}) are kept as they are; change them through an import.
          </Text>
        )}
        <Fieldset legend="Save">
          <TextInput label="What changed" placeholder="e.g. kp from the new lot" maxLength={500} key={form.key('message')} {...form.getInputProps('message')} />
          <Group justify="flex-end" mt="md">
            <Button variant="default" onClick={onCancel}>
              Cancel
            </Button>
            <Button type="submit" loading={pending}>
              {baseVersion === undefined ? 'Create profile' : `Save as version ${baseVersion + 1}`}
            </Button>
          </Group>
        </Fieldset>
      </Stack>
      {derivingFor && (
        <DeriveDialog opened polarity={derivingFor} onClose={() => setDerivingFor(undefined)} onApply={(values) => applyDerived(derivingFor, values)} />
      )}
    </form>
  );
}
