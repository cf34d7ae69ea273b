import type { MatchGroupResize, Sheet } from '@channelwright/shared/schemas';
import { formatQuantity, parseQuantity } from '@channelwright/shared/units';
import { Alert, Badge, Button, Group, Modal, Paper, SimpleGrid, Stack, Table, Text, TextInput } from '@mantine/core';
import { IconAlertTriangle, IconArrowsMaximize, IconCircleCheck } from '@tabler/icons-react';
import { useState } from 'react';
import { Quantity } from '../../../components/quantity';
import { useResizeMatchGroup } from '../api/resize-match-group';

const area = (w: number, l: number) => formatQuantity(w * l * 1e12, '', { digits: 4 });

function PlanTable({ plan }: { plan: MatchGroupResize }) {
  return (
    <Table aria-label={`Re-size plan of ${plan.group}`} fz="xs" verticalSpacing={3} striped>
      <Table.Thead>
        <Table.Tr>
          <Table.Th>Device</Table.Th>
          <Table.Th ta="right">W now → new</Table.Th>
          <Table.Th ta="right">L now → new</Table.Th>
          <Table.Th ta="right">W·L (µm²) now → new</Table.Th>
          <Table.Th ta="right">{plan.keep === 'vov' ? 'VOV' : 'gm/ID'} kept</Table.Th>
        </Table.Tr>
      </Table.Thead>
      <Table.Tbody>
        {plan.members.map((m) => (
          <Table.Tr key={m.deviceId}>
            <Table.Th scope="row">{m.name}</Table.Th>
            <Table.Td ta="right"><Quantity value={m.from.w} unit="m" /> → <Quantity value={m.to.w} unit="m" /></Table.Td>
            <Table.Td ta="right"><Quantity value={m.from.l} unit="m" /> → <Quantity value={m.to.l} unit="m" /></Table.Td>
            <Table.Td ta="right">{area(m.from.w, m.from.l)} → {area(m.to.w, m.to.l)}</Table.Td>
            <Table.Td ta="right">{plan.keep === 'vov' ? <Quantity value={m.to.vov} unit="V" /> : `${m.to.gmId.toFixed(2)} /V`}</Table.Td>
          </Table.Tr>
        ))}
      </Table.Tbody>
    </Table>
  );
}

/** One group: its worst pair's offset against the budget, and the re-sizing to a target shown before it is applied. */
function GroupCard({ sheet, group, editable }: { sheet: Sheet; group: Sheet['totals']['matchGroups'][number]; editable: boolean }) {
  const [targetText, setTargetText] = useState(group.budget !== null ? formatQuantity(group.budget, 'V') : '');
  const resize = useResizeMatchGroup(sheet.id);
  const [plan, setPlan] = useState<MatchGroupResize | null>(null);
  const target = parseQuantity(targetText, 'V');
  const names = (ids: string[]) => ids.map((id) => sheet.devices.find((d) => d.id === id)?.targets.name ?? id).join(', ');
  const preview = () => {
    if (!target.ok) return;
    resize.mutate({ group: group.name, sigmaVos: target.value }, { onSuccess: setPlan });
  };
  const apply = () => {
    if (!plan) return;
    resize.mutate(
      { group: group.name, sigmaVos: plan.target, apply: true, versions: Object.fromEntries(plan.members.map((m) => [m.deviceId, m.version])) },
      { onSuccess: () => setPlan(null) },
    );
  };
  return (
    <Paper withBorder radius="sm" p="sm" component="section" aria-label={`Match group ${group.name}`}>
      <Group justify="space-between" align="flex-start" wrap="wrap">
        <Stack gap={2}>
          <Text fw={600}>{group.name}</Text>
          <Text size="xs" c="dimmed">{names(group.deviceIds)}</Text>
        </Stack>
        {group.meetsBudget !== null && (
          <Badge radius="sm" tt="none" variant="light" color={group.meetsBudget ? 'green' : 'red'} leftSection={group.meetsBudget ? <IconCircleCheck size={12} /> : <IconAlertTriangle size={12} />}>
            {group.meetsBudget ? 'meets its budget' : 'over its budget'}
          </Badge>
        )}
      </Group>
      <Table fz="xs" verticalSpacing={2} withRowBorders={false} mt="xs" aria-label={`Offset of ${group.name}`}>
        <Table.Tbody>
          <Table.Tr><Table.Th scope="row">σ(VOS), input-referred (worst pair)</Table.Th><Table.Td ta="right"><Quantity value={group.sigmaVos} unit="V" /></Table.Td></Table.Tr>
          <Table.Tr><Table.Th scope="row">σ(ΔVT)</Table.Th><Table.Td ta="right"><Quantity value={group.sigmaVt} unit="V" /></Table.Td></Table.Tr>
          <Table.Tr><Table.Th scope="row">σ(Δβ/β)</Table.Th><Table.Td ta="right">{group.sigmaBeta === null ? '—' : `${(group.sigmaBeta * 100).toFixed(3)} %`}</Table.Td></Table.Tr>
          <Table.Tr><Table.Th scope="row">gm/ID of the pair</Table.Th><Table.Td ta="right">{group.gmId === null ? '—' : `${group.gmId.toFixed(2)} /V`}</Table.Td></Table.Tr>
          <Table.Tr><Table.Th scope="row">Budget σ(VOS)</Table.Th><Table.Td ta="right"><Quantity value={group.budget} unit="V" nullText="none set" /></Table.Td></Table.Tr>
          <Table.Tr><Table.Th scope="row">W·L per device meeting it</Table.Th><Table.Td ta="right">{group.requiredArea === null ? '—' : `${formatQuantity(group.requiredArea * 1e12, '', { digits: 4 })} µm²`}</Table.Td></Table.Tr>
        </Table.Tbody>
      </Table>
      {editable && (
        <Group gap="xs" align="flex-end" mt="xs">
          <TextInput label="Target σ(VOS)" size="xs" w={140} value={targetText} onChange={(e) => setTargetText(e.currentTarget.value)} error={targetText && !target.ok ? target.reason : undefined} placeholder="2 mV" />
          <Button size="xs" variant="light" leftSection={<IconArrowsMaximize size={14} />} disabled={!target.ok} loading={resize.isPending && !plan} onClick={preview}>
            Re-size to meet it…
          </Button>
        </Group>
      )}
      {resize.isError && <Text size="xs" c="red" mt={4} role="alert">{resize.error.message}</Text>}
      <Modal opened={plan !== null} onClose={() => setPlan(null)} title={`Re-size ${group.name}`} size="xl">
        {plan && (
          <Stack gap="sm">
            <Text size="sm">
              Every member's L × {plan.scale.toFixed(3)} at the same {plan.keep === 'vov' ? 'VOV' : 'gm/ID'}: σ(VOS) {formatQuantity(plan.before.sigmaVos, 'V')} → {formatQuantity(plan.after.sigmaVos, 'V')} (target {formatQuantity(plan.target, 'V')}), total gate area {area(plan.before.area, 1)} → {area(plan.after.area, 1)} µm².
            </Text>
            {!plan.meetsTarget && <Alert color="oxide" variant="light" title="The target is not met">{plan.limitedBy}</Alert>}
            <PlanTable plan={plan} />
            <Text size="xs" c="dimmed">Pelgrom (1989) mismatch combined into the input-referred offset as in Kinget (2005); first-order estimates: verify with the foundry&apos;s mismatch models.</Text>
            <Group justify="flex-end" gap="xs">
              <Button variant="default" size="xs" onClick={() => setPlan(null)}>Keep the sizes</Button>
              <Button size="xs" onClick={apply} loading={resize.isPending}>Apply to the sheet</Button>
            </Group>
          </Stack>
        )}
      </Modal>
    </Paper>
  );
}

/** The sheet's match groups with their offsets, budgets and re-sizing. */
export function MatchGroupsPanel({ sheet, editable }: { sheet: Sheet; editable: boolean }) {
  if (sheet.totals.matchGroups.length === 0) {
    return <Text size="sm" c="dimmed">No match groups: give matched devices the same match group on their pages.</Text>;
  }
  return (
    <SimpleGrid cols={{ base: 1, lg: 2 }} spacing="sm">
      {sheet.totals.matchGroups.map((group) => <GroupCard key={group.name} sheet={sheet} group={group} editable={editable} />)}
    </SimpleGrid>
  );
}
