import { type ProcessProfile } from '@channelwright/shared/schemas';
import { Badge, Button, Grid, Group, Modal, Paper, Stack, Text, Title } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import type { ReactNode } from 'react';
import { useNavigate, useParams, useSearchParams } from 'react-router-dom';
import { ErrorPanel } from '../../../components/error-panel';
import { InventedDataBadge } from '../../../components/invented-data-badge';
import { PageHeader } from '../../../components/page-header';
import { PageLoader } from '../../../components/page-loader';
import { RegionErrorBoundary } from '../../../components/region-error-boundary';
import { useSignedInUser } from '../../../lib/session/current-user';
import { canMaintainProcesses } from '../../../lib/session/permissions';
import { useProcess } from '../../../lib/processes/process';
import { useProcessVersions } from '../api/get-process-versions';
import { CornersTable } from '../components/corners-table';
import { ImportProcessPanel } from '../components/import-process-panel';
import { ModelCardSummary } from '../components/model-card-summary';
import { ModelCardUpload } from '../components/model-card-upload';
import { ParametersTable } from '../components/parameters-table';
import { ProcessCautions } from '../components/process-cautions';
import { ProfileActions } from '../components/profile-actions';
import { ProfileSummary } from '../components/profile-summary';
import { VersionDiff } from '../components/version-diff';
import { VersionHistory } from '../components/version-history';

function Section({ title, action, children }: { title: string; action?: ReactNode; children: ReactNode }) {
  return (
    <Paper withBorder radius="md" p="md" component="section" aria-label={title}>
      <Group justify="space-between" mb="sm">
        <Title order={2} fz="lg">
          {title}
        </Title>
        {action}
      </Group>
      <RegionErrorBoundary region={title.toLowerCase()}>{children}</RegionErrorBoundary>
    </Paper>
  );
}

/** What the app draws under the model card: the characterisation of the version (another feature). */
export type VersionCharacterisationView = (props: { profile: ProcessProfile; maintainer: boolean }) => ReactNode;

/** /processes/:id?version=n: one profile, the version asked for (the latest by default), its card, history and diffs. */
export default function ProcessRoute({ characterisation }: { characterisation?: VersionCharacterisationView }) {
  const { id = '' } = useParams();
  const [params] = useSearchParams();
  const versionParam = Number(params.get('version'));
  const version = Number.isInteger(versionParam) && versionParam > 0 ? versionParam : undefined;
  const maintainer = canMaintainProcesses(useSignedInUser());
  const profile = useProcess(id, version);
  const versions = useProcessVersions(id);
  const [importing, importDialog] = useDisclosure(false);
  const [uploadingCard, cardDialog] = useDisclosure(false);
  const navigate = useNavigate();

  if (profile.isPending) return <PageLoader label="Loading the process profile" />;
  if (profile.isError) return <ErrorPanel title="The process profile could not be loaded" message={profile.error.message} onRetry={() => void profile.refetch()} />;
  const { data } = profile;
  const { definition } = data.version;

  return (
    <>
      <PageHeader
        title={data.name}
        description={
          <Group gap={6} component="span">
            {data.demoData && <InventedDataBadge />}
            {data.deprecated && (
              <Badge size="sm" color="gray" variant="outline" tt="none">
                deprecated
              </Badge>
            )}
            {data.version.number !== data.latestVersion && (
              <Badge size="sm" color="orange" variant="light" tt="none">
                older version v{data.version.number}
              </Badge>
            )}
            <Text span size="sm" c="dimmed">
              {definition.description}
            </Text>
          </Group>
        }
        actions={<ProfileActions profile={data} maintainer={maintainer} onImport={importDialog.open} />}
      />
      <Stack gap="lg">
        <ProcessCautions demoData={data.demoData} parameterConvention={data.version.parameterConvention} />
        <Paper withBorder radius="md" p="md">
          <ProfileSummary profile={data} />
        </Paper>
        <Grid gap="lg">
          <Grid.Col span={{ base: 12, xl: 7 }}>
            <Section title="Device parameters">
              <ParametersTable caption="Device parameters" columns={[{ label: 'NMOS', params: definition.nmos }, { label: 'PMOS', params: definition.pmos }]} />
              <Text size="xs" c="dimmed" mt={4}>
                At tnom. PMOS values are polarity-normalised (vt0 = −VTP).
              </Text>
            </Section>
          </Grid.Col>
          <Grid.Col span={{ base: 12, xl: 5 }}>
            <Stack gap="lg">
              <Section title="Corners">
                <CornersTable process={definition} />
              </Section>
              <Section title="SPICE model names">
                <Text size="sm">
                  NMOS {definition.spiceModels?.nmos ?? '—'} · PMOS {definition.spiceModels?.pmos ?? '—'}
                  {Object.entries(definition.spiceModels?.flavours ?? {}).map(([flavour, model]) => ` · ${flavour} ${model}`).join('')}
                </Text>
                <Text size="xs" c="dimmed">
                  {definition.spiceModels ? 'The names a sheet\'s SPICE export gives each device type.' : 'None set: a sheet\'s SPICE export names them after the process (give them in the process file, spiceModels).'}
                </Text>
              </Section>
              {(definition.flavours ?? []).map((flavour) => (
                <Section key={flavour.name} title={`Flavour ${flavour.name}`}>
                  <Text size="sm" mb="xs">
                    {flavour.polarity.toUpperCase()} · {flavour.description ?? 'no description'}
                  </Text>
                  <ParametersTable caption={`Flavour ${flavour.name}`} columns={[{ label: flavour.name, params: flavour.params }]} />
                </Section>
              ))}
            </Stack>
          </Grid.Col>
        </Grid>
        <Section
          title="Model card"
          action={
            maintainer && (
              <Button size="compact-sm" variant="light" onClick={cardDialog.open}>
                Upload a card as v{data.latestVersion + 1}
              </Button>
            )
          }
        >
          <ModelCardSummary profile={data} />
        </Section>
        {characterisation && data.version.modelCard && (
          <Section title="Characterisation">{characterisation({ profile: data, maintainer })}</Section>
        )}
        <Section title="Version history">
          {versions.data ? <VersionHistory profileId={id} versions={versions.data} shown={data.version.number} /> : <PageLoader label="Loading versions" />}
        </Section>
        <Section title="Compare versions">
          {versions.data ? <VersionDiff key={versions.data[0]?.number} profileId={id} versions={versions.data} /> : <PageLoader label="Loading versions" />}
        </Section>
      </Stack>
      <Modal opened={importing} onClose={importDialog.close} title={`Import a new version of ${data.name}`} size="xl">
        <ImportProcessPanel
          target={{ profileId: data.id, baseVersion: data.latestVersion }}
          onImported={importDialog.close}
        />
      </Modal>
      <Modal opened={uploadingCard} onClose={cardDialog.close} title={`Upload a model card as v${data.latestVersion + 1} of ${data.name}`} size="xl">
        <ModelCardUpload
          profile={data}
          onUploaded={(saved) => {
            cardDialog.close();
            void navigate(`/processes/${encodeURIComponent(saved.id)}`);
          }}
        />
      </Modal>
    </>
  );
}
