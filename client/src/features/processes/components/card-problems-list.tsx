import type { ModelCardProblem } from '@channelwright/shared/schemas';
import { Table, Text } from '@mantine/core';

/** Every refused or wrong line of a card (or entry of its mapping), with its line number. */
export function CardProblemsList({ problems }: { problems: ModelCardProblem[] }) {
  return (
    <Table aria-label="Problems in the model card" withTableBorder verticalSpacing={4} fz="sm">
      <Table.Thead>
        <Table.Tr>
          <Table.Th w={60}>Line</Table.Th>
          <Table.Th>Problem</Table.Th>
        </Table.Tr>
      </Table.Thead>
      <Table.Tbody>
        {problems.map((problem, index) => (
          <Table.Tr key={`${problem.line ?? '-'}-${problem.field}-${index}`}>
            <Table.Td ff="monospace">{problem.line ?? '—'}</Table.Td>
            <Table.Td>
              <Text size="sm">
                {problem.field !== 'card' && (
                  <Text span ff="monospace" size="sm" c="dimmed">
                    {problem.field}:{' '}
                  </Text>
                )}
                {problem.message}
              </Text>
            </Table.Td>
          </Table.Tr>
        ))}
      </Table.Tbody>
    </Table>
  );
}
