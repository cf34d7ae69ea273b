import { parameterInfo } from '@channelwright/shared/schemas';
import { ActionIcon, Button, Fieldset, Group, SimpleGrid, Stack, TextInput } from '@mantine/core';
import type { UseFormReturnType } from '@mantine/form';
import { IconPlus, IconTrash } from '@tabler/icons-react';
import { newCorner, type ProcessFormValues } from '../utils/process-form-values';
import { ParameterInput } from './parameter-input';

const DVT = parameterInfo('dvt')!;
const KP_SCALE = parameterInfo('kpScale')!;

/** The editor's corners: a name and ΔVT, kp factor per polarity each. */
export function CornersFieldset({ form }: { form: UseFormReturnType<ProcessFormValues> }) {
  const { corners } = form.getValues();
  const quantity = (index: number, polarity: 'nmos' | 'pmos', shift: 'dvt' | 'kpScale', label: string) => {
    const path = `corners.${index}.${polarity}.${shift}`;
    return <ParameterInput key={form.key(path)} info={shift === 'dvt' ? DVT : KP_SCALE} label={label} {...form.getInputProps(path)} />;
  };
  return (
    <Fieldset legend="Corners (TT is always the nominal parameters)">
      <Stack gap="md">
        {corners.map((corner, index) => (
          <Fieldset key={corner.id} legend={`Corner ${index + 1}`} variant="unstyled">
            <Group align="flex-start" gap="sm" wrap="nowrap">
              <TextInput label="Name" w={90} maxLength={50} key={form.key(`corners.${index}.name`)} {...form.getInputProps(`corners.${index}.name`)} />
              <SimpleGrid cols={{ base: 1, sm: 2, lg: 4 }} style={{ flex: 1 }}>
                {quantity(index, 'nmos', 'dvt', 'NMOS ΔVT')}
                {quantity(index, 'nmos', 'kpScale', 'NMOS kp ×')}
                {quantity(index, 'pmos', 'dvt', 'PMOS ΔVT')}
                {quantity(index, 'pmos', 'kpScale', 'PMOS kp ×')}
              </SimpleGrid>
              <ActionIcon variant="subtle" color="red" mt={26} aria-label={`Remove corner ${index + 1}`} onClick={() => form.removeListItem('corners', index)}>
                <IconTrash size={16} />
              </ActionIcon>
            </Group>
          </Fieldset>
        ))}
        <Group>
          <Button
            variant="default"
            size="xs"
            leftSection={<IconPlus size={14} />}
            onClick={() => form.insertListItem('corners', newCorner())}
          >
            Add corner
          </Button>
        </Group>
      </Stack>
    </Fieldset>
  );
}
