import type { Project, Sheet } from '@channelwright/shared/schemas';
import { Anchor, Badge, Breadcrumbs, Group, Text } from '@mantine/core';
import { Link } from 'react-router-dom';

/** Where the sheet sits (home › project › sheet) and what it is sized in. */
export function SheetBreadcrumbs({ project, sheet, device }: { project?: Project; sheet: Sheet; device?: string }) {
  const sheetHref = `/sheets/${sheet.id}`;
  return (
    <nav aria-label="Breadcrumbs">
      <Breadcrumbs separatorMargin={6} fz="sm">
      <Anchor component={Link} to="/" size="sm">
        Projects
      </Anchor>
      <Anchor component={Link} to={`/projects/${sheet.projectId}`} size="sm">
        {project?.name ?? 'Project'}
      </Anchor>
      {device ? (
        <Anchor component={Link} to={sheetHref} size="sm">
          {sheet.name}
        </Anchor>
      ) : (
        <Text size="sm">{sheet.name}</Text>
      )}
        {device && <Text size="sm">{device}</Text>}
      </Breadcrumbs>
    </nav>
  );
}

/** The sheet's process version and its defaults, in one line of badges. */
export function SheetConditions({ sheet }: { sheet: Sheet }) {
  const { process } = sheet;
  return (
    <Group gap={6} wrap="wrap">
      <Badge variant="light" radius="sm" tt="none">
        {process.name} v{process.version}
      </Badge>
      {process.latestVersion > process.version && (
        <Badge variant="outline" color="oxide" radius="sm" tt="none">
          v{process.latestVersion} available
        </Badge>
      )}
      {process.deprecated && (
        <Badge variant="outline" color="red" radius="sm" tt="none">
          process deprecated
        </Badge>
      )}
      <Badge variant="outline" color="gray" radius="sm" tt="none">
        defaults: {sheet.corner} · {sheet.temperature ?? process.tnom} °C · {sheet.model}
      </Badge>
      <Badge variant="outline" color="gray" radius="sm" tt="none">
        VDD {process.vdd} V
      </Badge>
    </Group>
  );
}
