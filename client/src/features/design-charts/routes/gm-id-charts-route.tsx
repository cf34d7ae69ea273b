import type { Polarity } from '@channelwright/shared/schemas';
import { formatQuantity, parseQuantity } from '@channelwright/shared/units';
import { Alert, Anchor, Group, Paper, Select, Stack, Text } from '@mantine/core';
import { useRef, useState } from 'react';
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { ErrorPanel } from '../../../components/error-panel';
import { PageHeader } from '../../../components/page-header';
import { PageLoader } from '../../../components/page-loader';
import { QuantityInput } from '../../../components/quantity-input';
import { RegionErrorBoundary } from '../../../components/region-error-boundary';
import { currentTables, useProcessTables } from '../../../lib/characterisation/process-tables';
import { useProcess } from '../../../lib/processes/process';
import { useDesignChart } from '../api/get-design-chart';
import { GmIdCharts } from '../components/gm-id/gm-id-charts';
import { GmIdReadout } from '../components/gm-id/gm-id-readout';
import { SizeDevicePicker } from '../components/gm-id/size-device-picker';
import type { ChartPoint } from '../model/gm-id-curves';
import type { SizeDeviceHref } from '../model/device-from-chart';

interface Picks {
  corner?: string;
  temperature?: number;
  vds?: number;
  vsb?: number;
}

const deviceKey = (polarity: Polarity, flavour: string | null) => `${polarity}/${flavour ?? ''}`;
const voltageOptions = (values: number[]) => values.map((v) => ({ value: String(v), label: formatQuantity(v, 'V', { digits: 3 }) }));

export interface GmIdChartsRouteProps {
  /** The device page a chosen length and gm/ID open (the app passes the scratch device page). */
  sizeDeviceHref?: SizeDeviceHref;
}

/** /processes/:id/design-charts?version=n: the gm/ID design charts of a characterised version, device by device. */
export default function GmIdChartsRoute({ sizeDeviceHref }: GmIdChartsRouteProps = {}) {
  const { id = '' } = useParams();
  const [params] = useSearchParams();
  const asked = Number(params.get('version'));
  const profile = useProcess(id, Number.isInteger(asked) && asked > 0 ? asked : undefined);
  const version = profile.data?.version.number;
  const tables = useProcessTables(id, version);
  const devices = currentTables(tables.data);
  const [device, setDevice] = useState<string | null>(null);
  const [picks, setPicks] = useState<Picks>({});
  const [gmIdText, setGmIdText] = useState('15');
  // While a new gm/ID is being typed (and does not read yet), the figures of the last one stay.
  const lastGmId = useRef(15);
  const [chosenL, setChosenL] = useState<number | null>(null);
  const chosen = devices.find((t) => deviceKey(t.polarity, t.flavour) === device) ?? devices[0];
  const chart = useDesignChart(id, chosen && version ? { version, polarity: chosen.polarity, flavour: chosen.flavour ?? undefined, ...picks } : null);

  if (profile.isPending) return <PageLoader label="Loading the process profile" />;
  if (profile.isError) return <ErrorPanel title="The process profile could not be loaded" message={profile.error.message} onRetry={() => void profile.refetch()} />;
  const back = `/processes/${encodeURIComponent(id)}?version=${version}`;
  const typed = parseQuantity(gmIdText, '1/V');
  if (typed.ok && typed.value > 0) lastGmId.current = typed.value;
  const gmId = lastGmId.current;
  const axes = chart.data?.axes;
  const pick = (field: keyof Picks) => (value: string | null) => setPicks((p) => ({ ...p, [field]: field === 'corner' ? (value ?? undefined) : value === null ? undefined : Number(value) }));
  const pmos = chosen?.polarity === 'pmos';
  const lengths = chart.data?.curves.map((curve) => curve.l) ?? [];
  // Another device may have other lengths: the shortest stands in until one of its own is chosen.
  const l = chosenL !== null && lengths.includes(chosenL) ? chosenL : lengths[0];
  const pickPoint = (point: ChartPoint) => {
    setChosenL(point.l);
    setGmIdText(formatQuantity(point.gmId, '', { digits: 4 }));
  };
  const sizeHref =
    sizeDeviceHref && chart.data && l !== undefined && version
      ? sizeDeviceHref({ processId: id, version, polarity: chart.data.polarity, flavour: chart.data.flavour, corner: chart.data.corner, temperature: chart.data.temperature, vds: chart.data.vds, vsb: chart.data.vsb, l, gmId })
      : undefined;

  return (
    <>
      <PageHeader
        title={`gm/ID design charts · ${profile.data.name} v${version}`}
        description={
          <>
            From the tables characterised from the version&apos;s model card.{' '}
            <Anchor component={Link} to={back} size="sm">
              Back to the process
            </Anchor>
          </>
        }
      />
      <Stack gap="md">
        <Text size="xs" c="dimmed" role="note">
          Read a gm/ID for the inversion level you want, then the gain, fT and VDSsat each length gives there; W = ID / (ID/W). These are the model card&apos;s
          behaviour on a grid, estimates: verify with the foundry&apos;s models and a sign-off simulation.
        </Text>
        {tables.isPending && <PageLoader label="Loading the tables" />}
        {tables.isError && <Alert color="red" variant="light">{tables.error.message}</Alert>}
        {tables.data && devices.length === 0 && (
          <Alert color="gray" variant="light" title="No tables yet">
            This version has not been characterised (or its characterisation is still running). The charts appear once its tables are stored.
          </Alert>
        )}
        {chosen && (
          <Paper withBorder radius="sm" p="sm">
            <Stack gap="xs">
              <Group gap="sm" align="flex-end" wrap="wrap">
                <Select
                  label="Device"
                  size="xs"
                  w={170}
                  allowDeselect={false}
                  data={devices.map((t) => ({ value: deviceKey(t.polarity, t.flavour), label: `${t.polarity.toUpperCase()}${t.flavour ? ` ${t.flavour}` : ''} (${t.model})` }))}
                  value={deviceKey(chosen.polarity, chosen.flavour)}
                  onChange={(value) => {
                    setDevice(value);
                    setPicks({});
                  }}
                />
                <Select label="Corner" size="xs" w={90} allowDeselect={false} data={axes?.corners ?? chosen.grid.corners} value={chart.data?.corner ?? null} onChange={pick('corner')} />
                <Select
                  label="Temperature"
                  size="xs"
                  w={110}
                  allowDeselect={false}
                  data={(axes?.temperatures ?? chosen.grid.temperatures).map((t) => ({ value: String(t), label: `${t} °C` }))}
                  value={chart.data ? String(chart.data.temperature) : null}
                  onChange={pick('temperature')}
                />
                <Select label={pmos ? 'VSD' : 'VDS'} size="xs" w={100} allowDeselect={false} data={voltageOptions(axes?.vds ?? chosen.grid.vds)} value={chart.data ? String(chart.data.vds) : null} onChange={pick('vds')} />
                <Select label={pmos ? 'VBS' : 'VSB'} size="xs" w={100} allowDeselect={false} data={voltageOptions(axes?.vsb ?? chosen.grid.vsb)} value={chart.data ? String(chart.data.vsb) : null} onChange={pick('vsb')} />
                <QuantityInput label="Read at gm/ID" unit="1/V" size="xs" w={130} value={gmIdText} onChange={setGmIdText} />
              </Group>
              {l !== undefined && <SizeDevicePicker lengths={lengths} l={l} onLengthChange={setChosenL} gmId={gmId} href={sizeHref} />}
            </Stack>
          </Paper>
        )}
        {chosen && (
          <RegionErrorBoundary region="the design charts">
            <Stack gap="sm">
              {chart.data?.warnings.map((w) => (
                <Alert key={w.code} color="yellow" variant="light">
                  {w.message}
                </Alert>
              ))}
              {chart.data && <GmIdReadout chart={chart.data} gmId={gmId} />}
              <GmIdCharts chart={chart.data} loading={chart.isPending} error={chart.error} marker={gmId} chosenL={l} onPickPoint={pickPoint} />
            </Stack>
          </RegionErrorBoundary>
        )}
      </Stack>
    </>
  );
}
