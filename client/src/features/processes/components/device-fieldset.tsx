import { DEVICE_PARAMETERS, type Polarity } from '@channelwright/shared/schemas';
import { Button, Fieldset, SimpleGrid, Stack } from '@mantine/core';
import type { UseFormReturnType } from '@mantine/form';
import { IconAtom2 } from '@tabler/icons-react';
import type { ProcessFormValues } from '../utils/process-form-values';
import { ParameterInput } from './parameter-input';

interface DeviceFieldsetProps {
  form: UseFormReturnType<ProcessFormValues>;
  polarity: Polarity;
  onDerive: () => void;
}

/** One polarity's parameters, each with its unit, what it read and its plausible range. */
export function DeviceFieldset({ form, polarity, onDerive }: DeviceFieldsetProps) {
  const legend = polarity.toUpperCase();
  return (
    <Fieldset legend={legend}>
      <Stack gap="sm">
        <Button variant="light" size="xs" leftSection={<IconAtom2 size={14} />} onClick={onDerive} style={{ alignSelf: 'flex-start' }}>
          Derive γ and 2φF from tox and doping…
        </Button>
        <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="sm" verticalSpacing="xs">
          {DEVICE_PARAMETERS.map((info) => {
            const path = `${polarity}.${info.name}`;
            return (
              <ParameterInput
                key={form.key(path)}
                info={info}
                label={`${info.symbol} (${info.name})${info.optional ? ', optional' : ''}`}
                withAsterisk={!info.optional}
                {...form.getInputProps(path)}
              />
            );
          })}
        </SimpleGrid>
      </Stack>
    </Fieldset>
  );
}
