import DeviceRoute from '../../features/devices/routes/device-route';
import { designCharts } from './design-charts';

/** A sheet's device page composes two features: the devices' editor and, under its results, the design charts. */
export default function DevicePage() {
  return <DeviceRoute charts={designCharts} />;
}
