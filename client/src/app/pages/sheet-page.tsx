import { DeviceRowActions } from '../../features/devices/components/device-row-actions';
import { RevisionPanel } from '../../features/revisions/components/revision-panel';
import SheetRoute from '../../features/sheets/routes/sheet-route';

/**
 * The sheet page composes three features: the sheet itself (table, totals, recompute, export), the
 * revisions' freeze-and-review panel, and the devices' duplicate and delete actions on each row.
 */
export default function SheetPage() {
  return (
    <SheetRoute
      reviewPanel={(sheet) => <RevisionPanel sheetId={sheet.id} sheetName={sheet.name} />}
      deviceActions={(device, sheet) => <DeviceRowActions sheet={sheet} device={device} />}
    />
  );
}
