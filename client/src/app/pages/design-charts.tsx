import { lazy } from 'react';
import type { SizedDeviceView } from '../../features/devices/model/sized-device';

// The charts bring Recharts along: they load after the form and the results (the devices feature
// wraps them in a Suspense boundary and an error boundary of their own).
const DesignChartsPanel = lazy(() => import('../../features/design-charts/components/design-charts-panel').then((module) => ({ default: module.DesignChartsPanel })));

/** The design charts of a sized device, as the device pages draw them under the results. */
export const designCharts: SizedDeviceView = (device) => <DesignChartsPanel {...device} />;
