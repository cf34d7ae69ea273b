import type { Project } from '@channelwright/shared/schemas';
import { Badge, Table } from '@mantine/core';
import { DayText } from '../../../components/day-text';
import { LinkedTitle } from '../../../components/linked-title';

/** The user's projects: name and description, their role, how many sheets and members, last change. */
export function ProjectsTable({ projects }: { projects: Project[] }) {
  return (
    <Table.ScrollContainer minWidth={640}>
      <Table aria-label="Projects" highlightOnHover verticalSpacing="xs" fz="sm">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Project</Table.Th>
            <Table.Th w={120}>Your role</Table.Th>
            <Table.Th w={80} ta="right">Sheets</Table.Th>
            <Table.Th w={90} ta="right">Members</Table.Th>
            <Table.Th w={120}>Changed</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {projects.map((project) => (
            <Table.Tr key={project.id}>
              <Table.Td>
                <LinkedTitle to={`/projects/${project.id}`} title={project.name} description={project.description} />
              </Table.Td>
              <Table.Td>
                <Badge variant="light" color={project.myRole ? 'channel' : 'gray'} radius="sm" tt="none" style={{ overflow: 'visible' }}>
                  {project.myRole ?? 'administrator'}
                </Badge>
              </Table.Td>
              <Table.Td ta="right" style={{ fontVariantNumeric: 'tabular-nums' }}>
                {project.sheetCount}
              </Table.Td>
              <Table.Td ta="right" style={{ fontVariantNumeric: 'tabular-nums' }}>
                {project.memberCount}
              </Table.Td>
              <Table.Td>
                <DayText iso={project.updatedAt} />
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
