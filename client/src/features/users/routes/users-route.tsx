import { Paper } from '@mantine/core';
import { ErrorPanel } from '../../../components/error-panel';
import { PageHeader } from '../../../components/page-header';
import { PageLoader } from '../../../components/page-loader';
import { useSignedInUser } from '../../../lib/session/current-user';
import { useUsers } from '../api/get-users';
import { useUpdateUser } from '../api/update-user';
import { UsersTable } from '../components/users-table';

export default function UsersRoute() {
  const me = useSignedInUser();
  const users = useUsers();
  const updateUser = useUpdateUser();

  let body;
  if (users.isPending) body = <PageLoader label="Loading users" />;
  else if (users.isError)
    body = <ErrorPanel title="The users could not be loaded" message={users.error.message} onRetry={() => void users.refetch()} />;
  else
    body = (
      <Paper withBorder radius="md" p={0}>
        <UsersTable
          users={users.data}
          currentUserId={me.id}
          onChange={(input) => updateUser.mutate(input)}
          pendingUserId={updateUser.isPending ? updateUser.variables?.id : undefined}
        />
      </Paper>
    );

  return (
    <>
      <PageHeader
        title="Users"
        description="Give administrator rights, let people maintain or read the whole process library, or turn an account off. A new account reads only the processes of the projects it is added to."
      />
      {body}
    </>
  );
}
