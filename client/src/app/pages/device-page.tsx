import DeviceRoute from '../../features/devices/routes/device-route';
import { CornerMatrix } from '../../features/sheets/components/corner-matrix';
import { RegionErrorBoundary } from '../../components/region-error-boundary';
import { designCharts } from './design-charts';

/**
 * A sheet's device page composes two features: the devices' editor with, under its results, the design charts;
 * and, for a stored device, the sheets' corner matrix of that one device.
 */
export default function DevicePage() {
  return (
    <DeviceRoute
      charts={designCharts}
      corners={({ sheetId, deviceId }) => (
        <RegionErrorBoundary region="the corner matrix">
          <CornerMatrix sheetId={sheetId} deviceIds={[deviceId]} />
        </RegionErrorBoundary>
      )}
    />
  );
}
