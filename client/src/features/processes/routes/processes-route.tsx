import { Button, Group, Modal, Paper, Switch, TextInput } from '@mantine/core';
import { useDebouncedValue, useDisclosure } from '@mantine/hooks';
import { IconPlus, IconSearch, IconUpload } from '@tabler/icons-react';
import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { ErrorPanel } from '../../../components/error-panel';
import { PageHeader } from '../../../components/page-header';
import { PageLoader } from '../../../components/page-loader';
import { useSignedInUser } from '../../../lib/session/current-user';
import { canMaintainProcesses } from '../../../lib/session/permissions';
import { useProcesses } from '../api/get-processes';
import { ImportProcessPanel } from '../components/import-process-panel';
import { ProcessLibraryTable } from '../components/process-library-table';

/** /processes: the library of process profiles. */
export default function ProcessesRoute() {
  const user = useSignedInUser();
  const maintainer = canMaintainProcesses(user);
  const navigate = useNavigate();
  const [search, setSearch] = useState('');
  const [includeDeprecated, setIncludeDeprecated] = useState(false);
  const [debouncedSearch] = useDebouncedValue(search.trim(), 250);
  const [importing, importDialog] = useDisclosure(false);
  const processes = useProcesses({ search: debouncedSearch || undefined, includeDeprecated });

  let body;
  if (processes.isPending) body = <PageLoader label="Loading process profiles" />;
  else if (processes.isError)
    body = <ErrorPanel title="The process library could not be loaded" message={processes.error.message} onRetry={() => void processes.refetch()} />;
  else body = <ProcessLibraryTable profiles={processes.data} />;

  return (
    <>
      <PageHeader
        title="Process profiles"
        description="The process numbers every sizing rests on. Each edit is a new version; sheets record the version they used."
        actions={
          maintainer && (
            <Group gap="xs">
              <Button variant="default" leftSection={<IconUpload size={16} />} onClick={importDialog.open}>
                Import
              </Button>
              <Button component={Link} to="/processes/new" leftSection={<IconPlus size={16} />}>
                New profile
              </Button>
            </Group>
          )
        }
      />
      <Group mb="md" gap="lg" align="flex-end">
        <TextInput
          label="Search"
          placeholder="Name, node class or description"
          leftSection={<IconSearch size={16} />}
          value={search}
          onChange={(event) => setSearch(event.currentTarget.value)}
          w={320}
        />
        <Switch label="Show deprecated" checked={includeDeprecated} onChange={(event) => setIncludeDeprecated(event.currentTarget.checked)} mb={8} />
      </Group>
      <Paper withBorder radius="md" p={0}>
        {body}
      </Paper>
      <Modal opened={importing} onClose={importDialog.close} title="Import a process profile" size="xl">
        <ImportProcessPanel onImported={(profile) => navigate(`/processes/${profile.id}`)} />
      </Modal>
    </>
  );
}
