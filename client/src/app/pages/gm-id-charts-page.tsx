import GmIdChartsRoute from '../../features/design-charts/routes/gm-id-charts-route';
import { workbenchHref } from '../../features/devices/model/workbench-link';

/** The gm/ID design charts, whose chosen length and gm/ID open the scratch device page on the table model. */
export default function GmIdChartsPage() {
  return <GmIdChartsRoute sizeDeviceHref={(device) => workbenchHref({ ...device, model: 'table' })} />;
}
