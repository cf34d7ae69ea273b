import { Alert, Button, Group, Paper, Skeleton, Stack, Text, Title } from '@mantine/core';
import { IconDownload } from '@tabler/icons-react';
import { useRef, useState, type ReactNode } from 'react';
import { RegionErrorBoundary } from '../../../../components/region-error-boundary';
import { isApiError } from '../../../../lib/api-error';
import type { ChartSeries } from '../../model/chart-series';
import { downloadChart } from '../../model/export-chart';

interface ChartFrameProps {
  title: string;
  /** Under the title: what is held and what is swept. */
  caption?: ReactNode;
  /** File name of a download, without extension. */
  fileName: string;
  /** Drawn into downloaded files, which lack the page's HTML legend. */
  legend?: ChartSeries[];
  loading: boolean;
  error: unknown;
  /** A figure read from the chart, shown in the header (e.g. the subthreshold slope). */
  readout?: ReactNode;
  children: ReactNode;
}

function DownloadButtons({ target, fileName, legend }: { target: React.RefObject<HTMLDivElement | null>; fileName: string; legend?: ChartSeries[] }) {
  const [problem, setProblem] = useState<string | null>(null);
  const save = (format: 'svg' | 'png') => {
    if (!target.current) return;
    setProblem(null);
    downloadChart(target.current, fileName, format, legend).catch((error: Error) => setProblem(error.message));
  };
  return (
    <Group gap={4}>
      {problem && (
        <Text size="xs" c="red">
          {problem}
        </Text>
      )}
      {(['svg', 'png'] as const).map((format) => (
        <Button key={format} size="compact-xs" variant="subtle" color="gray" leftSection={<IconDownload size={12} />} onClick={() => save(format)} aria-label={`Download ${fileName} as ${format.toUpperCase()}`}>
          {format.toUpperCase()}
        </Button>
      ))}
    </Group>
  );
}

/** One chart in its own bordered region: title, caption, downloads, and a failure that stays inside it. */
export function ChartFrame({ title, caption, fileName, legend, loading, error, readout, children }: ChartFrameProps) {
  const plot = useRef<HTMLDivElement>(null);
  const message = isApiError(error) || error instanceof Error ? error.message : null;
  return (
    <Paper withBorder radius="sm" p="xs" role="figure" aria-label={title}>
      <Stack gap={4}>
        <Group justify="space-between" align="flex-start" wrap="nowrap" gap="xs">
          <Stack gap={0}>
            <Title order={3} fz="sm" fw={600}>
              {title}
            </Title>
            {caption && (
              <Text size="xs" c="dimmed">
                {caption}
              </Text>
            )}
          </Stack>
          <DownloadButtons target={plot} fileName={fileName} legend={legend} />
        </Group>
        {readout}
        <RegionErrorBoundary region={`the chart “${title}”`}>
          <div ref={plot} style={{ background: 'var(--mantine-color-body)' }}>
            {message ? (
              <Alert color="red" variant="light" title="This chart could not be computed">
                {message}
              </Alert>
            ) : loading ? (
              <Skeleton height={220} aria-label={`Computing ${title}`} />
            ) : (
              children
            )}
          </div>
        </RegionErrorBoundary>
      </Stack>
    </Paper>
  );
}
