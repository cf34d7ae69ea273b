import ScratchDeviceRoute from '../../features/devices/routes/scratch-device-route';
import { designCharts } from './design-charts';

/** "Size a device" composes the devices' scratch form with the design charts under its results. */
export default function ScratchDevicePage() {
  return <ScratchDeviceRoute charts={designCharts} />;
}
