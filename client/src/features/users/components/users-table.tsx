import type { GlobalRole, User } from '@channelwright/shared/schemas';
import { Badge, Group, Select, Switch, Table, Text, Tooltip } from '@mantine/core';
import type { UpdateUserInput } from '../api/update-user';
import { formatDay } from '../../../lib/format-date';

interface UsersTableProps {
  users: User[];
  /** The administrator looking at the table, who may not lock themselves out. */
  currentUserId: string;
  onChange: (input: UpdateUserInput) => void;
  /** The user whose change is on its way to the server, if any. */
  pendingUserId?: string;
}

const ROLE_OPTIONS: { value: GlobalRole; label: string }[] = [
  { value: 'member', label: 'Member' },
  { value: 'admin', label: 'Administrator' },
];


function SelfGuard({ isSelf, children }: { isSelf: boolean; children: React.ReactElement }) {
  if (!isSelf) return children;
  return (
    <Tooltip label="You cannot change your own role or access">
      <span>{children}</span>
    </Tooltip>
  );
}

/**
 * Without library access, a member reads only the process profiles its projects' sheets use; administrators
 * and process maintainers read (and write) all of them.
 */
function readsAllAnyway(user: User): boolean {
  return user.role === 'admin' || user.processMaintainer;
}

/** Every account with its role, its access, whether it maintains the process library and whether it reads all of it. */
export function UsersTable({ users, currentUserId, onChange, pendingUserId }: UsersTableProps) {
  const rows = users.map((user) => {
    const isSelf = user.id === currentUserId;
    const busy = pendingUserId === user.id;
    return (
      <Table.Tr key={user.id}>
        <Table.Td>
          <Group gap={6} wrap="nowrap">
            <Text size="sm" fw={500}>
              {user.displayName}
            </Text>
            {isSelf && (
              <Badge size="xs" variant="light">
                you
              </Badge>
            )}
          </Group>
          <Text size="xs" c="dimmed">
            {user.email}
          </Text>
        </Table.Td>
        <Table.Td w={180}>
          <SelfGuard isSelf={isSelf}>
            <Select
              aria-label={`Role of ${user.displayName}`}
              data={ROLE_OPTIONS}
              value={user.role}
              allowDeselect={false}
              disabled={isSelf || busy}
              size="xs"
              onChange={(role) => role && onChange({ id: user.id, changes: { role: role as GlobalRole } })}
            />
          </SelfGuard>
        </Table.Td>
        <Table.Td>
          <Switch
            aria-label={`${user.displayName} maintains process profiles`}
            checked={user.processMaintainer}
            disabled={busy}
            onChange={(event) => onChange({ id: user.id, changes: { processMaintainer: event.currentTarget.checked } })}
          />
        </Table.Td>
        <Table.Td>
          <Tooltip label="Administrators and process maintainers read the whole library anyway" disabled={!readsAllAnyway(user)}>
            <Switch
              aria-label={`${user.displayName} reads the whole process library`}
              checked={readsAllAnyway(user) || (user.libraryAccess ?? false)}
              disabled={busy || readsAllAnyway(user)}
              onChange={(event) => onChange({ id: user.id, changes: { libraryAccess: event.currentTarget.checked } })}
            />
          </Tooltip>
        </Table.Td>
        <Table.Td>
          <SelfGuard isSelf={isSelf}>
            <Switch
              aria-label={`${user.displayName} may sign in`}
              checked={!user.disabled}
              disabled={isSelf || busy}
              onChange={(event) => onChange({ id: user.id, changes: { disabled: !event.currentTarget.checked } })}
            />
          </SelfGuard>
        </Table.Td>
        <Table.Td>
          <Text size="sm" c="dimmed">
            {formatDay(user.createdAt)}
          </Text>
        </Table.Td>
      </Table.Tr>
    );
  });

  return (
    <Table.ScrollContainer minWidth={840}>
      <Table verticalSpacing="sm" highlightOnHover aria-label="Users">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Name</Table.Th>
            <Table.Th>Role</Table.Th>
            <Table.Th>Process maintainer</Table.Th>
            <Table.Th>Whole library</Table.Th>
            <Table.Th>May sign in</Table.Th>
            <Table.Th>Joined</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>{rows}</Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
