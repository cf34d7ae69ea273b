import { cornerNames, type ProcessProfile } from '@channelwright/shared/schemas';
import { Alert, Button, Code, Group, Modal, ScrollArea, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { PageLoader } from '../../../components/page-loader';
import { useModelCard } from '../api/get-model-card';
import { CardMappingTables } from './card-mapping-tables';

function CardText({ profile, opened, onClose }: { profile: ProcessProfile; opened: boolean; onClose: () => void }) {
  const card = useModelCard(profile.id, profile.version.number, opened);
  return (
    <Modal opened={opened} onClose={onClose} title={`Model card of ${profile.name} v${profile.version.number}`} size="xl">
      <Stack gap="xs">
        <Text size="xs" c="dimmed">
          The card as Channelwright wrote it from the parsed statements: this text, not the uploaded file, is what the simulator is given.
        </Text>
        {card.isPending && <PageLoader label="Loading the model card" />}
        {card.isError && <Alert color="red" variant="light">{card.error.message}</Alert>}
        {card.data && (
          <ScrollArea.Autosize mah="65vh">
            <Code block aria-label="Model card text" fz="xs">
              {card.data.text}
            </Code>
          </ScrollArea.Autosize>
        )}
      </Stack>
    </Modal>
  );
}

/** A version's model card: its hash and size, how its sections and models map to corners and devices, and its text. */
export function ModelCardSummary({ profile }: { profile: ProcessProfile }) {
  const card = profile.version.modelCard;
  const [viewing, view] = useDisclosure(false);
  if (!card) {
    return (
      <Text size="sm" c="dimmed">
        No model card on this version: devices are sized with the analytic models only.
      </Text>
    );
  }
  const models = new Set(card.sections.flatMap((s) => s.models.map((m) => m.name)));
  return (
    <Stack gap="sm">
      <Group justify="space-between" align="flex-start" gap="xs">
        <Stack gap={2}>
          <Text size="sm">
            {card.sections.length} {card.sections.length === 1 ? 'section' : 'sections'}, {models.size} {models.size === 1 ? 'model' : 'models'},{' '}
            {(card.bytes / 1024).toFixed(1)} kB as stored
          </Text>
          <Text size="xs" c="dimmed">
            SHA-256{' '}
            <Text span ff="monospace" size="xs" aria-label="Model card SHA-256" style={{ wordBreak: 'break-all' }}>
              {card.sha256}
            </Text>
          </Text>
        </Stack>
        <Button size="compact-sm" variant="light" onClick={view.open}>
          View the card text
        </Button>
      </Group>
      <CardMappingTables card={card} corners={cornerNames(profile.version.definition)} />
      <CardText profile={profile} opened={viewing} onClose={view.close} />
    </Stack>
  );
}
