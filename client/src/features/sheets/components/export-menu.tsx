import { Button, Group, Menu } from '@mantine/core';
import { IconChevronDown, IconDownload } from '@tabler/icons-react';
import { useExportSheet, type ExportChoice } from '../api/export-sheet';

const CHOICES: Array<{ label: string; hint: string; choice: ExportChoice }> = [
  { label: 'CSV, lengths in µm', hint: 'W, L in µm, “(um)” in the header', choice: { format: 'csv', lengths: 'um' } },
  { label: 'CSV, table only', hint: 'for a plain CSV reader', choice: { format: 'csv', metadata: 'none' } },
  { label: 'Metadata of the CSV', hint: 'key,value rows: the second file', choice: { format: 'csv-metadata' } },
  { label: 'SPICE instance lines', hint: 'W, L, nf, m; BSIM3/BSIM4 models', choice: { format: 'spice' } },
  { label: 'SPICE lines without nf', hint: 'for level 1–3 models', choice: { format: 'spice', fingers: 'omit' } },
];

/** Download the sheet as CSV (three ways), its metadata, or SPICE instance lines. */
export function ExportMenu({ sheetId, sheetName }: { sheetId: string; sheetName: string }) {
  const exporter = useExportSheet();
  return (
    <Group gap={4} wrap="nowrap">
      <Button variant="default" size="xs" leftSection={<IconDownload size={14} />} loading={exporter.isPending} onClick={() => exporter.mutate({ sheetId, sheetName, choice: { format: 'csv' } })} title="Metadata in # lines, lengths in m">
        Download CSV
      </Button>
      <Menu position="bottom-end" withinPortal>
        <Menu.Target>
          <Button variant="default" size="xs" rightSection={<IconChevronDown size={12} />} aria-label="More export formats">
            More formats
          </Button>
        </Menu.Target>
        <Menu.Dropdown>
          {CHOICES.map(({ label, hint, choice }) => (
            <Menu.Item key={label} onClick={() => exporter.mutate({ sheetId, sheetName, choice })} title={hint}>
              {label}
            </Menu.Item>
          ))}
        </Menu.Dropdown>
      </Menu>
    </Group>
  );
}
