import type { ExtractionResultResponse } from '@channelwright/shared/schemas';
import { Alert, Badge, Group, Stack, Table, Text, Title } from '@mantine/core';
import { Quantity } from '../../../components/quantity';

/** How the report names each parameter: the symbol designers use, and what it is. */
const NAMES: Record<string, string> = {
  vt0: 'VT0 — threshold at VSB = 0',
  kp: 'KP — transconductance parameter',
  n: 'n — slope factor',
  gamma: 'γ — body-effect coefficient',
  twoPhiF: '2φF — surface potential',
  lambda: 'λ — channel-length modulation (at the profile\'s lRef)',
  dl: 'ΔL — length reduction',
  theta0: 'θ0 — mobility degradation',
  theta1: 'θ1 — velocity saturation (θ1/Leff)',
  theta2: 'θ2 — mobility degradation, second order',
  dibl: 'DIBL coefficient',
  diblExp: 'DIBL length exponent',
  vtl: 'VT length term',
  vtlExp: 'VT length exponent',
  nl: 'n length term',
  pclm: 'output-conductance coefficient',
  vtTc: 'VT temperature coefficient',
  muExp: 'mobility temperature exponent',
  muExpL: 'mobility exponent length term',
};
const REGIONS: Record<string, string> = { weak: 'Weak inversion', moderate: 'Moderate inversion', strong: 'Strong inversion', all: 'All points' };
const percent = (value: number) => `${(value * 100).toPrecision(2)} %`;

/** Every fitted parameter with its value, unit and standard error; the error per region; what was held and left out. */
export function ParameterReport({ result }: { result: ExtractionResultResponse }) {
  return (
    <Stack gap="md">
      {!result.converged && (
        <Alert color="orange" variant="light" title="The fit did not converge">
          It stopped at its iteration limit after {result.iterations} iterations; the values below are its last estimate. Re-run with more iterations, or hold
          parameters the data cannot tell.
        </Alert>
      )}
      <Table aria-label="Fitted parameters" withTableBorder striped fz="sm">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Parameter</Table.Th>
            <Table.Th>Fitted</Table.Th>
            <Table.Th>Standard error</Table.Th>
            <Table.Th>Start estimate</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {result.parameters.map((p) => (
            <Table.Tr key={p.name}>
              <Table.Td>{NAMES[p.name] ?? p.name}</Table.Td>
              <Table.Td>
                <Quantity value={p.value} unit={p.unit} />
              </Table.Td>
              <Table.Td>{p.standardError === null ? <Text span c="dimmed" size="sm">not told by the data</Text> : <>± <Quantity value={p.standardError} unit={p.unit} digits={2} /></>}</Table.Td>
              <Table.Td>
                <Quantity value={p.initial} unit={p.unit} c="dimmed" />
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
      <Group align="flex-start" gap="xl" wrap="wrap">
        <Stack gap={4}>
          <Title order={3} fz="md">
            Error of the fitted model
          </Title>
          <Table aria-label="Error per region" withTableBorder fz="sm" w="auto">
            <Table.Thead>
              <Table.Tr>
                <Table.Th>Region</Table.Th>
                <Table.Th>Points</Table.Th>
                <Table.Th>RMS of ID error</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {result.rms.map((r) => (
                <Table.Tr key={r.region}>
                  <Table.Td>{REGIONS[r.region]}</Table.Td>
                  <Table.Td>{r.points}</Table.Td>
                  <Table.Td>{percent(r.rms)}</Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
          {result.densityRms !== null && <Text size="sm">Current density at the measured gm/ID: {percent(result.densityRms)} RMS (what sets W when sizing).</Text>}
          <Text size="sm" c="dimmed">
            {result.iterations} iterations, {result.seconds.toFixed(1)} s. <Badge variant="light" color={result.converged ? 'teal' : 'orange'}>{result.converged ? 'converged' : 'not converged'}</Badge>
          </Text>
        </Stack>
        {result.held.length > 0 && (
          <Stack gap={4} maw={520}>
            <Title order={3} fz="md">
              Held at the base profile
            </Title>
            <Table aria-label="Parameters held" withTableBorder fz="sm">
              <Table.Tbody>
                {result.held.map((h) => (
                  <Table.Tr key={h.name}>
                    <Table.Td>{NAMES[h.name] ?? h.name}</Table.Td>
                    <Table.Td>
                      <Text size="sm" c="dimmed">
                        {h.reason}
                      </Text>
                    </Table.Td>
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
          </Stack>
        )}
      </Group>
      <ExcludedPoints excluded={result.excluded} />
    </Stack>
  );
}

/** The points left out, grouped by reason with their rows, so a long list stays readable. */
function ExcludedPoints({ excluded }: { excluded: ExtractionResultResponse['excluded'] }) {
  if (excluded.length === 0) return <Text size="sm">Every point was used.</Text>;
  const byReason = new Map<string, (number | null)[]>();
  for (const point of excluded) byReason.set(point.reason, [...(byReason.get(point.reason) ?? []), point.row]);
  return (
    <Stack gap={4}>
      <Title order={3} fz="md">
        {excluded.length} points left out
      </Title>
      <Table aria-label="Points left out" withTableBorder fz="sm">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Reason</Table.Th>
            <Table.Th>Points</Table.Th>
            <Table.Th>Rows of the file</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {[...byReason].map(([reason, rows]) => (
            <Table.Tr key={reason}>
              <Table.Td>{reason}</Table.Td>
              <Table.Td>{rows.length}</Table.Td>
              <Table.Td ff="monospace">
                {rows.slice(0, 8).map((row) => row ?? '—').join(', ')}
                {rows.length > 8 && ' …'}
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Stack>
  );
}
