import type { Problem } from '@channelwright/shared/schemas';
import { Table, Text } from '@mantine/core';

interface ImportProblemsListProps {
  problems: Problem[];
  /** The table's name; a process file's by default. */
  caption?: string;
  /** What `row` counts: the rows of a process file, or the lines of a model card. */
  rowLabel?: 'Row' | 'Line';
  /** Show the field column (a process file's column, a card mapping's entry). */
  withField?: boolean;
}

/** The server's reasons for refusing a file, by row or line (of the file) and field (the column or mapping entry). */
export function ImportProblemsList({ problems, caption = 'Problems in the file', rowLabel = 'Row', withField = true }: ImportProblemsListProps) {
  return (
    <Table aria-label={caption} withTableBorder verticalSpacing={4} fz="sm">
      <Table.Thead>
        <Table.Tr>
          <Table.Th w={60}>{rowLabel}</Table.Th>
          {withField && <Table.Th w={100}>Field</Table.Th>}
          <Table.Th>Problem</Table.Th>
        </Table.Tr>
      </Table.Thead>
      <Table.Tbody>
        {problems.map((problem, index) => (
          <Table.Tr key={`${problem.row ?? '-'}-${problem.field ?? ''}-${index}`}>
            <Table.Td ff="monospace">{problem.row ?? '—'}</Table.Td>
            {withField && <Table.Td ff="monospace">{problem.field ?? '—'}</Table.Td>}
            <Table.Td>
              <Text size="sm">{problem.message}</Text>
            </Table.Td>
          </Table.Tr>
        ))}
      </Table.Tbody>
    </Table>
  );
}
