import type { DesignChart } from '@channelwright/shared/schemas';
import { Table } from '@mantine/core';
import { Quantity } from '../../../../components/quantity';
import { lengthLabel, readAtGmId } from '../../model/gm-id-curves';

/** Every length's figures at one gm/ID, read from the curves: the numbers a designer takes from the charts. */
export function GmIdReadout({ chart, gmId }: { chart: DesignChart; gmId: number }) {
  return (
    <Table aria-label="Figures at the chosen gm/ID" withTableBorder verticalSpacing={4} fz="sm" highlightOnHover>
      <Table.Thead>
        <Table.Tr>
          <Table.Th>Length</Table.Th>
          <Table.Th ta="right">VGS</Table.Th>
          <Table.Th ta="right">ID/W</Table.Th>
          <Table.Th ta="right">gm/gds</Table.Th>
          <Table.Th ta="right">fT</Table.Th>
          <Table.Th ta="right">VDSsat</Table.Th>
        </Table.Tr>
      </Table.Thead>
      <Table.Tbody>
        {chart.curves.map((curve) => {
          const at = readAtGmId(curve, gmId);
          return (
            <Table.Tr key={curve.l}>
              <Table.Td>{lengthLabel(curve.l)}</Table.Td>
              {at ? (
                <>
                  <Table.Td ta="right"><Quantity value={at.vgs} unit="V" digits={3} /></Table.Td>
                  <Table.Td ta="right"><Quantity value={at.idW} unit="A/m" digits={3} /></Table.Td>
                  <Table.Td ta="right"><Quantity value={at.gain} digits={3} /></Table.Td>
                  <Table.Td ta="right"><Quantity value={at.ft} unit="Hz" digits={3} /></Table.Td>
                  <Table.Td ta="right"><Quantity value={at.vdsat} unit="V" digits={3} /></Table.Td>
                </>
              ) : (
                <Table.Td colSpan={5} c="dimmed">
                  this length does not reach that gm/ID
                </Table.Td>
              )}
            </Table.Tr>
          );
        })}
      </Table.Tbody>
    </Table>
  );
}
