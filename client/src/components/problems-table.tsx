import type { Problem } from '@channelwright/shared/schemas';
import { Table, Text } from '@mantine/core';

interface ProblemsTableProps {
  problems: Problem[];
  /** The table's accessible name, e.g. "Problems in the curve file". */
  label: string;
  /** What the file's fields are called: "Column" for a CSV, "Field" for a form. */
  fieldHeading?: string;
}

/** Why the server refused a file: each problem with its row (the line of the file) and field. */
export function ProblemsTable({ problems, label, fieldHeading = 'Field' }: ProblemsTableProps) {
  return (
    <Table aria-label={label} withTableBorder verticalSpacing={4} fz="sm">
      <Table.Thead>
        <Table.Tr>
          <Table.Th w={60}>Row</Table.Th>
          <Table.Th w={120}>{fieldHeading}</Table.Th>
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
