import type { ModelCardSummary } from '@channelwright/shared/schemas';
import { SimpleGrid, Table, Text } from '@mantine/core';

const sectionText = (section: string | null | undefined) => (section === undefined ? 'not mapped (no table)' : section === null ? 'statements outside any .lib section' : `.lib ${section}`);

/** The models of a card, each once (a model appears in every corner's section), with its level. */
function modelsOf(card: ModelCardSummary) {
  const seen = new Map<string, { name: string; polarity: string; level: number; sections: number }>();
  for (const section of card.sections) {
    for (const model of section.models) {
      const known = seen.get(model.name);
      if (known) known.sections += 1;
      else seen.set(model.name, { name: model.name, polarity: model.polarity, level: model.level, sections: 1 });
    }
  }
  return [...seen.values()];
}

/** How a card is read: which section each corner takes its models from, and which model is which device. */
export function CardMappingTables({ card, corners }: { card: ModelCardSummary; corners: string[] }) {
  const devices = card.mapping.devices;
  return (
    <SimpleGrid cols={{ base: 1, md: 2 }} spacing="md">
      <Table aria-label="Corners and card sections" withTableBorder verticalSpacing={4} fz="sm">
        <Table.Thead>
          <Table.Tr>
            <Table.Th w={90}>Corner</Table.Th>
            <Table.Th>Card section</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {corners.map((corner) => (
            <Table.Tr key={corner}>
              <Table.Td fw={600}>{corner}</Table.Td>
              <Table.Td ff={corner in card.mapping.corners ? 'monospace' : undefined} c={corner in card.mapping.corners ? undefined : 'dimmed'}>
                {sectionText(corner in card.mapping.corners ? card.mapping.corners[corner] : undefined)}
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
      <Table aria-label="Card models and devices" withTableBorder verticalSpacing={4} fz="sm">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Model</Table.Th>
            <Table.Th>Type, level</Table.Th>
            <Table.Th>Sized as</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {modelsOf(card).map((model) => {
            const device = devices.find((d) => d.model === model.name);
            return (
              <Table.Tr key={model.name}>
                <Table.Td ff="monospace">{model.name}</Table.Td>
                <Table.Td>
                  {model.polarity} {model.level}
                </Table.Td>
                <Table.Td>
                  {device ? (
                    `${device.polarity.toUpperCase()}${device.flavour ? ` ${device.flavour}` : ''}`
                  ) : (
                    <Text span size="sm" c="dimmed">
                      not mapped (not characterised)
                    </Text>
                  )}
                </Table.Td>
              </Table.Tr>
            );
          })}
        </Table.Tbody>
      </Table>
    </SimpleGrid>
  );
}
