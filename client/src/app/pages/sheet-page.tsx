import { RevisionPanel } from '../../features/revisions/components/revision-panel';
import SheetRoute from '../../features/workbench/routes/sheet-route';

/** The sheet page composes two features: the workbench's sheet and the revisions' freeze-and-review panel. */
export default function SheetPage() {
  return <SheetRoute reviewPanel={(sheet) => <RevisionPanel sheetId={sheet.id} sheetName={sheet.name} />} />;
}
