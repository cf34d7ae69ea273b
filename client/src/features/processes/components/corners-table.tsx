import { cornerNames, parameterInfo, type Process } from '@channelwright/shared/schemas';
import { Table, Text } from '@mantine/core';
import { displayQuantity } from '../utils/display-quantity';

const DVT = parameterInfo('dvt')!;
const KP_SCALE = parameterInfo('kpScale')!;
const NOMINAL = { dvt: 0, kpScale: 1 };

/** The corners: ΔVT and kp factor per polarity; TT is the nominal parameters, listed or not. */
export function CornersTable({ process }: { process: Process }) {
  const rows = cornerNames(process).map((name) => {
    const corner = process.corners.find((c) => c.name === name) ?? { name, nmos: NOMINAL, pmos: NOMINAL };
    return (
      <Table.Tr key={name}>
        <Table.Th scope="row">{name}</Table.Th>
        <Table.Td ff="monospace" ta="right">{displayQuantity(corner.nmos.dvt, DVT)}</Table.Td>
        <Table.Td ff="monospace" ta="right">{displayQuantity(corner.nmos.kpScale, KP_SCALE)}</Table.Td>
        <Table.Td ff="monospace" ta="right">{displayQuantity(corner.pmos.dvt, DVT)}</Table.Td>
        <Table.Td ff="monospace" ta="right">{displayQuantity(corner.pmos.kpScale, KP_SCALE)}</Table.Td>
      </Table.Tr>
    );
  });
  return (
    <>
      <Table.ScrollContainer minWidth={380}>
        <Table striped withTableBorder aria-label="Corners" verticalSpacing={6}>
          <Table.Thead>
            <Table.Tr>
              <Table.Th>Corner</Table.Th>
              <Table.Th ta="right">NMOS ΔVT</Table.Th>
              <Table.Th ta="right">NMOS kp ×</Table.Th>
              <Table.Th ta="right">PMOS ΔVT</Table.Th>
              <Table.Th ta="right">PMOS kp ×</Table.Th>
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>{rows}</Table.Tbody>
        </Table>
      </Table.ScrollContainer>
      <Text size="xs" c="dimmed" mt={4}>
        ΔVT &gt; 0 and kp × &lt; 1 are slower. The first letter of a corner is the NMOS, the second the PMOS.
      </Text>
    </>
  );
}
