import { Paper, Table, Text, Title } from '@mantine/core';
import { Quantity } from './quantity';
import type { ResultGroup } from '../lib/results/result-groups';

/** One group of results as a table: the symbol (its meaning on hover) and the value right-aligned with its unit. */
export function ResultGroupTable({ group, idPrefix = '' }: { group: ResultGroup; /** Keeps ids unique when several devices' groups share a page. */ idPrefix?: string }) {
  const titleId = `result-group-${idPrefix}${group.title.toLowerCase().replace(/\W+/g, '-')}`;
  return (
    <Paper withBorder radius="sm" p="xs">
      <Title order={3} fz="xs" tt="uppercase" c="dimmed" lts={0.4} fw={600} px={6} pb={4} id={titleId}>
        {group.title}
      </Title>
      <Table aria-labelledby={titleId} verticalSpacing={3} horizontalSpacing={6} fz="sm" withRowBorders={false} striped="even">
        <Table.Tbody>
          {group.rows.map((row) => (
            <Table.Tr key={row.symbol}>
              <Table.Th scope="row" fw={500} style={{ whiteSpace: 'nowrap' }} title={row.meaning}>
                {row.symbol}
              </Table.Th>
              <Table.Td ta="right">
                {typeof row.value === 'string' ? (
                  <Text component="span" inherit>
                    {row.value}
                  </Text>
                ) : (
                  <Quantity value={row.value} unit={row.unit} nullText={row.nullText} />
                )}
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Paper>
  );
}
