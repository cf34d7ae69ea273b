import type { Problem } from '@channelwright/shared/schemas';
import { Table, Text } from '@mantine/core';

/** The server's reasons for refusing a file, by row (the line of the file) and field (the column). */
export function ImportProblemsList({ problems }: { problems: Problem[] }) {
  return (
    <Table aria-label="Problems in the file" withTableBorder verticalSpacing={4} fz="sm">
      <Table.Thead>
        <Table.Tr>
          <Table.Th w={60}>Row</Table.Th>
          <Table.Th w={100}>Field</Table.Th>
          <Table.Th>Problem</Table.Th>
        </Table.Tr>
      </Table.Thead>
      <Table.Tbody>
        {problems.map((problem, index) => (
          <Table.Tr key={`${problem.row ?? '-'}-${problem.field ?? ''}-${index}`}>
            <Table.Td ff="monospace">{problem.row ?? '—'}</Table.Td>
            <Table.Td ff="monospace">{problem.field ?? '—'}</Table.Td>
            <Table.Td>
              <Text size="sm">{problem.message}</Text>
            </Table.Td>
          </Table.Tr>
        ))}
      </Table.Tbody>
    </Table>
  );
}
