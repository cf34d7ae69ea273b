import type { SheetImportResult } from '@channelwright/shared/schemas';
import { Alert, Badge, Button, FileInput, Group, Modal, Stack, Table, Text } from '@mantine/core';
import { IconFileImport } from '@tabler/icons-react';
import { useState } from 'react';
import { isApiError } from '../../../lib/api-error';
import { useImportSheet } from '../api/import-sheet';

function Preview({ result }: { result: SheetImportResult }) {
  return (
    <Stack gap="xs">
      <Group gap="xs">
        <Badge variant="light" color="green" tt="none">{result.created.length} new</Badge>
        <Badge variant="light" tt="none">{result.updated.length} updated</Badge>
        <Badge variant="light" color={result.problems.length ? 'red' : 'gray'} tt="none">{result.problems.length} in error</Badge>
        <Text size="xs" c="dimmed">separated by “{result.delimiter}”</Text>
      </Group>
      {result.created.length + result.updated.length > 0 && (
        <Text size="xs">
          {result.created.length > 0 && <>Adds {result.created.map((r) => r.name).join(', ')}. </>}
          {result.updated.length > 0 && <>Updates {result.updated.map((r) => r.name).join(', ')}.</>}
        </Text>
      )}
      {result.problems.length > 0 && (
        <Table aria-label="Rows in error" fz="xs" verticalSpacing={2} striped>
          <Table.Thead>
            <Table.Tr>
              <Table.Th>Row</Table.Th>
              <Table.Th>Column</Table.Th>
              <Table.Th>Problem</Table.Th>
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {result.problems.map((p, i) => (
              <Table.Tr key={i}>
                <Table.Td>{p.row ?? '—'}</Table.Td>
                <Table.Td>{p.field ?? '—'}</Table.Td>
                <Table.Td>{p.message}</Table.Td>
              </Table.Tr>
            ))}
          </Table.Tbody>
        </Table>
      )}
      {result.ignoredColumns.length > 0 && <Text size="xs" c="dimmed">Not read (results or unknown): {result.ignoredColumns.join(', ')}.</Text>}
    </Stack>
  );
}

/** Import a CSV of devices: the file is read and shown first, then applied in one transaction. */
export function ImportDialog({ sheetId, opened, onClose }: { sheetId: string; opened: boolean; onClose: () => void }) {
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<SheetImportResult | null>(null);
  const importer = useImportSheet(sheetId);
  const close = () => {
    setFile(null);
    setPreview(null);
    importer.reset();
    onClose();
  };
  const read = (chosen: File | null) => {
    setFile(chosen);
    setPreview(null);
    if (chosen) importer.mutate({ file: chosen, mode: 'preview' }, { onSuccess: setPreview });
  };
  const apply = (onlyValid: boolean) => file && importer.mutate({ file, mode: 'apply', onlyValid }, { onSuccess: close });
  const refusal = importer.error;
  const good = preview ? preview.created.length + preview.updated.length : 0;
  return (
    <Modal opened={opened} onClose={close} title="Import devices from a CSV" size="xl">
      <Stack gap="sm">
        <Text size="xs" c="dimmed">
          The columns of the CSV export, units in the header (“L (um)” works too), SI prefixes in cells (“20u”); UTF-8, comma or semicolon, at most 1 MB. A row whose name the sheet has updates that device.
        </Text>
        <FileInput label="CSV file" accept=".csv,text/csv" value={file} onChange={read} leftSection={<IconFileImport size={16} />} clearable />
        {refusal && (
          <Alert color="red" variant="light" title="The file was refused" role="alert">
            <Text size="sm">{refusal.message}</Text>
            {isApiError(refusal) && refusal.problems?.map((p, i) => <Text key={i} size="xs">Row {p.row ?? '—'}, {p.field}: {p.message}</Text>)}
          </Alert>
        )}
        {preview && <Preview result={preview} />}
        <Group justify="flex-end" gap="xs">
          <Button variant="default" size="xs" onClick={close}>Cancel</Button>
          {preview && preview.problems.length > 0 && good > 0 && (
            <Button variant="light" size="xs" loading={importer.isPending} onClick={() => apply(true)}>{good === 1 ? 'Apply the good row only' : `Apply the ${good} good rows only`}</Button>
          )}
          <Button size="xs" disabled={!preview || preview.problems.length > 0 || good === 0} loading={importer.isPending && Boolean(preview)} onClick={() => apply(false)}>
            Apply
          </Button>
        </Group>
      </Stack>
    </Modal>
  );
}
