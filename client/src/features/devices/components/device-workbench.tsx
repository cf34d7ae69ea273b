import type { Process } from '@channelwright/shared/schemas';
import { formatQuantity } from '@channelwright/shared/units';
import { Grid, Paper, Skeleton, Stack } from '@mantine/core';
import { Suspense, type ReactNode } from 'react';
import { RegionErrorBoundary } from '../../../components/region-error-boundary';
import { currentTables, useProcessTables } from '../../../lib/characterisation/process-tables';
import { useDeviceSizing } from '../hooks/use-device-sizing';
import { processChoicesOf } from '../model/process-choices';
import type { SizedDeviceView } from '../model/sized-device';
import type { FieldErrors, ProcessRef, TargetDefaults } from '../model/size-request';
import type { TargetsValues } from '../model/targets';
import { ResultsPanel } from './results-panel';
import { TargetsForm } from './targets-form';

interface DeviceWorkbenchProps {
  values: TargetsValues;
  onChange: <K extends keyof TargetsValues>(field: K, value: TargetsValues[K]) => void;
  process: Process;
  processRef: ProcessRef;
  /** A sheet's defaults for an empty corner or temperature. */
  defaults?: TargetDefaults;
  readOnly?: boolean;
  /** Above the targets, e.g. the process picker or the device's name and function. */
  formHeader?: ReactNode;
  /** Under the targets, e.g. the save button. */
  formFooter?: ReactNode;
  /** Refusals from elsewhere (a save), shown beside their fields. */
  extraErrors?: FieldErrors;
  /** Drawn under the results once the device is sized (the app puts the design charts here). */
  charts?: SizedDeviceView;
}

/** Targets on the left, live results on the right, the curves underneath. */
export function DeviceWorkbench({ values, onChange, process, processRef, defaults, readOnly, formHeader, formFooter, extraErrors, charts }: DeviceWorkbenchProps) {
  const sizing = useDeviceSizing(values, processRef, defaults);
  const tables = useProcessTables(processRef.processId, processRef.processVersion);
  const choices = { ...processChoicesOf(process), tableModel: currentTables(tables.data).length > 0 };
  const pickVov = (vov: number) => {
    onChange('vov', formatQuantity(vov, 'V', { digits: 3 }));
    onChange('constraint', 'vov');
  };
  const chartsRequest = sizing.answeredRequest;

  return (
    <Stack gap="sm">
      <Grid gap="sm" align="flex-start">
        <Grid.Col span={{ base: 12, md: 4, xl: 3 }}>
          <Paper withBorder radius="sm" p="sm">
            <Stack gap="sm">
              {formHeader}
              <TargetsForm values={values} onChange={onChange} process={choices} errors={{ ...sizing.errors, ...extraErrors }} defaults={defaults} readOnly={readOnly} />
              {formFooter}
            </Stack>
          </Paper>
        </Grid.Col>
        <Grid.Col span={{ base: 12, md: 8, xl: 9 }}>
          <ResultsPanel
            result={sizing.result}
            polarity={values.polarity}
            missing={sizing.missing}
            invalid={sizing.invalid}
            error={sizing.error}
            errorShownInForm={sizing.errorShownInForm}
            updating={sizing.updating}
          />
        </Grid.Col>
      </Grid>
      {charts && sizing.result && chartsRequest && (
        <RegionErrorBoundary region="the charts">
          <Suspense fallback={<Skeleton height={320} aria-label="Loading the charts" />}>
            {charts({ request: chartsRequest, result: sizing.result, process, onPickVov: readOnly ? undefined : pickVov })}
          </Suspense>
        </RegionErrorBoundary>
      )}
    </Stack>
  );
}
