import { PROJECT_ROLES, type ProjectRole } from '@channelwright/shared/schemas';
import { ActionIcon, Badge, Paper, Select, Stack, Table, Text, Title, Tooltip } from '@mantine/core';
import { IconUserMinus } from '@tabler/icons-react';
import { ErrorPanel } from '../../../components/error-panel';
import { PageLoader } from '../../../components/page-loader';
import { useChangeMemberRole } from '../api/change-member-role';
import { useMembers } from '../../../lib/projects/members';
import { useRemoveMember } from '../api/remove-member';
import { AddMemberForm } from './add-member-form';
import { ROLE_LABELS, ROLE_MEANINGS } from './role-labels';

interface MembersPanelProps {
  projectId: string;
  /** Owners (and administrators) change roles, add and remove members. */
  manage: boolean;
  currentUserId: string;
}

/** Who is in the project and in which role; owners manage it here. */
export function MembersPanel({ projectId, manage, currentUserId }: MembersPanelProps) {
  const members = useMembers(projectId);
  const changeRole = useChangeMemberRole(projectId);
  const remove = useRemoveMember(projectId);

  let body;
  if (members.isPending) body = <PageLoader label="Loading the members" />;
  else if (members.isError) body = <ErrorPanel title="The members could not be loaded" message={members.error.message} onRetry={() => void members.refetch()} />;
  else
    body = (
      <Table aria-label="Members" verticalSpacing={4} fz="sm">
        <Table.Tbody>
          {members.data.map((member) => (
            <Table.Tr key={member.userId}>
              <Table.Td>
                <Text size="sm" fw={500}>
                  {member.displayName}
                  {member.userId === currentUserId && (
                    <Badge size="xs" variant="light" ml={6} radius="sm">
                      you
                    </Badge>
                  )}
                </Text>
                <Text size="xs" c="dimmed">
                  {member.email}
                </Text>
              </Table.Td>
              <Table.Td w={170}>
                {manage ? (
                  <Select
                    size="xs"
                    w={160}
                    aria-label={`Role of ${member.displayName}`}
                    data={PROJECT_ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }))}
                    value={member.role}
                    allowDeselect={false}
                    disabled={changeRole.isPending}
                    onChange={(role) => role && role !== member.role && changeRole.mutate({ projectId, userId: member.userId, role: role as ProjectRole })}
                  />
                ) : (
                  <Tooltip label={ROLE_MEANINGS[member.role]}>
                    <Badge variant="light" color="gray" radius="sm" tt="none">
                      {ROLE_LABELS[member.role]}
                    </Badge>
                  </Tooltip>
                )}
              </Table.Td>
              {manage && (
                <Table.Td w={36}>
                  <Tooltip label={`Remove ${member.displayName} from the project`}>
                    <ActionIcon
                      variant="subtle"
                      color="red"
                      size="sm"
                      aria-label={`Remove ${member.displayName}`}
                      loading={remove.isPending && remove.variables?.userId === member.userId}
                      onClick={() => remove.mutate({ projectId, userId: member.userId })}
                    >
                      <IconUserMinus size={14} />
                    </ActionIcon>
                  </Tooltip>
                </Table.Td>
              )}
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    );

  return (
    <Paper withBorder radius="sm" p="sm" component="section" aria-labelledby="members-title">
      <Stack gap="xs">
        <Title order={2} fz="md" id="members-title">
          Members
        </Title>
        {body}
        {manage && <AddMemberForm projectId={projectId} />}
      </Stack>
    </Paper>
  );
}
