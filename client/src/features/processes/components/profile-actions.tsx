import type { ProcessProfile } from '@channelwright/shared/schemas';
import { Button, Group, Menu } from '@mantine/core';
import { IconArchive, IconArchiveOff, IconCopy, IconDots, IconDownload, IconPencil, IconTrash, IconUpload } from '@tabler/icons-react';
import { Link, useNavigate } from 'react-router-dom';
import { useDeleteProcess } from '../api/delete-process';
import { useDeprecateProcess } from '../api/deprecate-process';
import { useExportProcess } from '../api/export-process';

interface ProfileActionsProps {
  profile: ProcessProfile;
  /** Whether the user may change the library (the server checks again). */
  maintainer: boolean;
  onImport: () => void;
}

/** Export for everyone; edit, import a version, duplicate, deprecate and delete for maintainers only. */
export function ProfileActions({ profile, maintainer, onImport }: ProfileActionsProps) {
  const navigate = useNavigate();
  const exportProcess = useExportProcess();
  const deprecate = useDeprecateProcess();
  const remove = useDeleteProcess();
  const shown = profile.version.number;

  return (
    <Group gap="xs">
      <Button
        variant="default"
        leftSection={<IconDownload size={16} />}
        loading={exportProcess.isPending}
        onClick={() => exportProcess.mutate({ id: profile.id, version: shown, name: profile.name })}
      >
        Export v{shown}
      </Button>
      {maintainer && (
        <>
          <Button variant="default" leftSection={<IconUpload size={16} />} onClick={onImport}>
            Import a version
          </Button>
          <Button component={Link} to={`/processes/${profile.id}/edit`} leftSection={<IconPencil size={16} />}>
            Edit
          </Button>
          <Menu position="bottom-end" withinPortal>
            <Menu.Target>
              <Button variant="default" px="xs" aria-label="More actions">
                <IconDots size={16} />
              </Button>
            </Menu.Target>
            <Menu.Dropdown>
              <Menu.Item leftSection={<IconCopy size={14} />} component={Link} to={`/processes/new?from=${profile.id}&version=${shown}`}>
                Duplicate as a new profile
              </Menu.Item>
              <Menu.Item
                leftSection={profile.deprecated ? <IconArchiveOff size={14} /> : <IconArchive size={14} />}
                onClick={() => deprecate.mutate({ id: profile.id, deprecated: !profile.deprecated })}
              >
                {profile.deprecated ? 'Restore (undo deprecation)' : 'Deprecate'}
              </Menu.Item>
              <Menu.Divider />
              <Menu.Item
                color="red"
                leftSection={<IconTrash size={14} />}
                onClick={() => {
                  if (window.confirm(`Delete ${profile.name} with all its versions? This cannot be undone.`)) {
                    remove.mutate(profile.id, { onSuccess: () => void navigate('/processes') });
                  }
                }}
              >
                Delete
              </Menu.Item>
            </Menu.Dropdown>
          </Menu>
        </>
      )}
    </Group>
  );
}
