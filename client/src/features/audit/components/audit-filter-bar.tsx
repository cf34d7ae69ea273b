import { AUDIT_ACTIONS, AUDIT_ENTITY_TYPES } from '@channelwright/shared/schemas';
import { Button, Group, Select, TextInput } from '@mantine/core';
import type { AuditFilters } from '../api/audit-filters';

interface AuditFilterBarProps {
  filters: AuditFilters;
  onChange: (filters: AuditFilters) => void;
  /** The field the server refused, with its message. */
  error?: { field?: string; message: string } | null;
}

/** Filters of the audit trail: action, kind of thing, who (e-mail), and a date range (whole days, UTC). */
export function AuditFilterBar({ filters, onChange, error }: AuditFilterBarProps) {
  const set = (key: keyof AuditFilters) => (value: string | null) => onChange({ ...filters, [key]: value ?? undefined });
  const errorOf = (field: string) => (error?.field === field ? error.message : undefined);
  return (
    <Group gap="sm" align="flex-end" wrap="wrap" role="search" aria-label="Audit filters">
      <Select label="Action" placeholder="Any" data={[...AUDIT_ACTIONS]} value={filters.action ?? null} onChange={set('action')} clearable searchable w={220} error={errorOf('action')} />
      <Select label="Kind" placeholder="Any" data={[...AUDIT_ENTITY_TYPES]} value={filters.entityType ?? null} onChange={(value) => onChange({ ...filters, entityType: (value ?? undefined) as AuditFilters['entityType'] })} clearable w={170} error={errorOf('entityType')} />
      <TextInput label="Who (e-mail)" placeholder="Anyone" value={filters.actor ?? ''} onChange={(event) => set('actor')(event.currentTarget.value)} w={220} error={errorOf('actor')} />
      <TextInput label="From" type="date" value={filters.from ?? ''} onChange={(event) => set('from')(event.currentTarget.value || null)} w={160} error={errorOf('from')} />
      <TextInput label="To" type="date" value={filters.to ?? ''} onChange={(event) => set('to')(event.currentTarget.value || null)} w={160} error={errorOf('to')} />
      <Button variant="subtle" color="gray" size="sm" onClick={() => onChange({})}>
        Clear
      </Button>
    </Group>
  );
}
