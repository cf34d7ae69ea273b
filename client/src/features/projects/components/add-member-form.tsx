import { addMemberRequestSchema, PROJECT_ROLES, type AddMemberRequest } from '@channelwright/shared/schemas';
import { Button, Group, Select, TextInput } from '@mantine/core';
import { schemaResolver, useForm } from '@mantine/form';
import { IconUserPlus } from '@tabler/icons-react';
import { isApiError } from '../../../lib/api-error';
import { useAddMember } from '../api/add-member';
import { ROLE_LABELS } from './role-labels';

/** Adds an existing account to the project by its e-mail, with a role (owners). */
export function AddMemberForm({ projectId }: { projectId: string }) {
  const add = useAddMember(projectId);
  const form = useForm<AddMemberRequest>({
    mode: 'uncontrolled',
    initialValues: { email: '', role: 'designer' },
    validate: schemaResolver(addMemberRequestSchema, { sync: true }),
  });
  const submit = form.onSubmit((values) =>
    add.mutate(
      { projectId, request: addMemberRequestSchema.parse(values) },
      {
        onSuccess: () => form.reset(),
        onError: (error) => form.setFieldError(isApiError(error) && error.field === 'role' ? 'role' : 'email', error.message),
      },
    ),
  );
  return (
    <form onSubmit={submit} noValidate aria-label="Add a member">
      <Group gap="xs" align="flex-start" wrap="nowrap">
        <TextInput size="xs" label="Add by e-mail" placeholder="someone@brackenfold.example" style={{ flex: 1 }} key={form.key('email')} {...form.getInputProps('email')} />
        <Select
          size="xs"
          label="Role"
          w={112}
          data={PROJECT_ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }))}
          allowDeselect={false}
          key={form.key('role')}
          {...form.getInputProps('role')}
        />
        <Button size="xs" type="submit" mt={22} px="xs" loading={add.isPending} aria-label="Add member">
          <IconUserPlus size={14} />
        </Button>
      </Group>
    </form>
  );
}
