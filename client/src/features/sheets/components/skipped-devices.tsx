import { Alert, List, Text } from '@mantine/core';

interface Skipped {
  deviceId: string;
  name: string;
  reason: string;
}

/** The devices an analysis left out, grouped by reason ("M1, M2: the PMOS table is not ready …"). */
function byReason(skipped: readonly Skipped[]): Array<{ reason: string; names: string[] }> {
  const groups = new Map<string, string[]>();
  for (const { name, reason } of skipped) groups.set(reason, [...(groups.get(reason) ?? []), name]);
  return [...groups].map(([reason, names]) => ({ reason, names }));
}

/**
 * What an analysis could not check and why. With nothing checked at all (a table-model sheet whose tables are still
 * being characterised) it is the panel's whole answer, in an alert, instead of an empty table or chart.
 */
export function SkippedDevices({ skipped, nothingChecked, what }: { skipped: readonly Skipped[]; nothingChecked: boolean; what: string }) {
  if (skipped.length === 0) return null;
  const reasons = byReason(skipped).map(({ reason, names }) => (
    <List.Item key={reason}>
      <b>{names.join(', ')}</b>: {reason.replace(/^Not sized: /, '')}
    </List.Item>
  ));
  if (nothingChecked) {
    return (
      <Alert color="oxide" variant="light" title={`No device has a result ${what} can check yet`} role="status">
        <List size="sm" spacing={2}>{reasons}</List>
      </Alert>
    );
  }
  return (
    <div>
      <Text size="xs" c="dimmed">Not in {what} (no result to check):</Text>
      <List size="xs" c="dimmed" spacing={0}>{reasons}</List>
    </div>
  );
}
