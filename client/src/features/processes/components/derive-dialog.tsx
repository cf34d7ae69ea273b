import { parameterInfo, type DeriveProcessResponse, type ParameterInfo } from '@channelwright/shared/schemas';
import { parseQuantity } from '@channelwright/shared/units';
import { Alert, Button, Group, Modal, SimpleGrid, Stack, Table, Text } from '@mantine/core';
import { useState } from 'react';
import { useDeriveProcess } from '../api/derive-process';
import { displayQuantity } from '../utils/display-quantity';
import { ParameterInput } from './parameter-input';

const field = (name: string, unit: string, displayUnit: string, min: number, max: number, description: string): ParameterInfo => ({
  name, symbol: name, unit, displayUnit, plausible: { min, max }, hardLimit: { min, max }, description, optional: true,
});

const TOX = parameterInfo('tox')!;
const DOPING = field('substrateDoping', 'm⁻³', 'cm⁻³', 1e19, 1e27, 'Body doping: NA for NMOS, ND for PMOS');
const FLAT_BAND = field('flatBand', 'V', 'V', -3, 3, 'Flat-band voltage, polarity-normalised');
const TEMPERATURE = field('temperature', '°C', '°C', -200, 300, 'Temperature');

/** What the dialog hands back to the editor, in SI units. */
export interface DerivedValues {
  tox: number;
  gamma: number;
  twoPhiF: number;
  vt0?: number;
}

interface DeriveDialogProps {
  opened: boolean;
  polarity: 'nmos' | 'pmos';
  onClose: () => void;
  onApply: (values: DerivedValues) => void;
}

/** Each result with the parameter whose display unit it shares (Cox in fF/µm², as cj). */
const RESULT_ROWS: Array<[keyof DeriveProcessResponse, string, string]> = [
  ['cox', 'Cox', 'cj'],
  ['gamma', 'γ', 'gamma'],
  ['twoPhiF', '2φF', 'twoPhiF'],
  ['n', 'n (VSB = 0)', 'n'],
  ['vt0', 'VT0', 'vt0'],
];

/** The physics helper: Cox, γ, 2φF (and VT0 with a flat-band voltage) from tox and doping, with the constants and their sources. */
export function DeriveDialog({ opened, polarity, onClose, onApply }: DeriveDialogProps) {
  const [text, setText] = useState({ tox: '', substrateDoping: '', flatBand: '', temperature: '27 °C' });
  const derive = useDeriveProcess();
  const read = (name: keyof typeof text, info: ParameterInfo) => {
    const parsed = text[name].trim() === '' ? undefined : parseQuantity(text[name], info.unit);
    return parsed?.ok ? parsed.value : undefined;
  };
  const tox = read('tox', TOX);
  const doping = read('substrateDoping', DOPING);
  const flatBand = read('flatBand', FLAT_BAND);
  const temperature = read('temperature', TEMPERATURE) ?? 27;
  const result = derive.data;

  const run = () => {
    if (tox === undefined || doping === undefined) return;
    derive.mutate({ tox, substrateDoping: doping, temperature, ...(flatBand !== undefined && { flatBand }) });
  };
  const input = (name: keyof typeof text, info: ParameterInfo, label: string) => (
    <ParameterInput info={info} label={label} value={text[name]} onChange={(e) => setText({ ...text, [name]: e.currentTarget.value })} />
  );

  return (
    <Modal opened={opened} onClose={onClose} title={`Derive ${polarity.toUpperCase()} parameters from tox and doping`} size="xl">
      <Stack gap="md">
        <SimpleGrid cols={{ base: 1, sm: 2 }}>
          {input('tox', TOX, 'Oxide thickness tox')}
          {input('substrateDoping', DOPING, 'Body doping (e.g. 1e17 cm^-3)')}
          {input('flatBand', FLAT_BAND, 'Flat-band voltage VFB (optional, for VT0)')}
          {input('temperature', TEMPERATURE, 'Temperature')}
        </SimpleGrid>
        <Text size="xs" c="dimmed">
          The API takes the doping in m⁻³ (1e17 cm⁻³ = 1e23 m⁻³); this field reads either. Long-channel textbook equations; no
          quantum or poly-depletion corrections.
        </Text>
        <Group>
          <Button onClick={run} disabled={tox === undefined || doping === undefined} loading={derive.isPending}>
            Derive
          </Button>
        </Group>
        {derive.error && <Alert color="red" variant="light">{derive.error.message}</Alert>}
        {result && (
          <Stack gap="sm">
            <Table aria-label="Derived parameters" withTableBorder verticalSpacing={4}>
              <Table.Tbody>
                {RESULT_ROWS.filter(([key]) => result[key] !== undefined).map(([key, label, info]) => (
                  <Table.Tr key={key}>
                    <Table.Th scope="row">{label}</Table.Th>
                    <Table.Td ff="monospace">
                      {displayQuantity(result[key] as number, parameterInfo(info)!)}
                    </Table.Td>
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
            <Table aria-label="Constants and sources" verticalSpacing={2} fz="xs">
              <Table.Tbody>
                {result.constants.map((c) => (
                  <Table.Tr key={c.symbol}>
                    <Table.Td>{c.symbol}</Table.Td>
                    <Table.Td ff="monospace">{`${c.value}${c.unit ? ` ${c.unit}` : ''}`}</Table.Td>
                    <Table.Td c="dimmed">{c.source}</Table.Td>
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
            <Group justify="flex-end">
              <Button
                variant="light"
                onClick={() => {
                  onApply({ tox: tox!, gamma: result.gamma, twoPhiF: result.twoPhiF, ...(result.vt0 !== undefined && { vt0: result.vt0 }) });
                  onClose();
                }}
              >
                Use tox, γ, 2φF{result.vt0 !== undefined ? ' and VT0' : ''} for {polarity.toUpperCase()}
              </Button>
            </Group>
          </Stack>
        )}
      </Stack>
    </Modal>
  );
}
