import { createProjectRequestSchema, type CreateProjectRequestInput } from '@channelwright/shared/schemas';
import { Modal, Stack, TextInput, Textarea } from '@mantine/core';
import { schemaResolver, useForm } from '@mantine/form';
import { useNavigate } from 'react-router-dom';
import { DialogActions } from '../../../components/dialog-actions';
import { ServerErrorAlert } from '../../../components/server-error-alert';
import { useCreateProject } from '../api/create-project';

/** Names a new project; the creator becomes its owner and lands on its page. */
export function NewProjectDialog({ opened, onClose }: { opened: boolean; onClose: () => void }) {
  const navigate = useNavigate();
  const create = useCreateProject();
  const form = useForm<CreateProjectRequestInput>({
    mode: 'uncontrolled',
    initialValues: { name: '', description: '' },
    validate: schemaResolver(createProjectRequestSchema, { sync: true }),
  });
  const submit = form.onSubmit((values) =>
    create.mutate(createProjectRequestSchema.parse(values), { onSuccess: (project) => void navigate(`/projects/${project.id}`) }),
  );
  return (
    <Modal opened={opened} onClose={onClose} title="New project" size="md">
      <form onSubmit={submit} noValidate aria-label="New project">
        <Stack gap="sm">
          <ServerErrorAlert title="The project was not created" error={create.error} />
          <TextInput label="Name" withAsterisk data-autofocus key={form.key('name')} {...form.getInputProps('name')} />
          <Textarea label="Description" rows={2} key={form.key('description')} {...form.getInputProps('description')} />
          <DialogActions onCancel={onClose} submitLabel="Create project" pending={create.isPending} />
        </Stack>
      </form>
    </Modal>
  );
}
