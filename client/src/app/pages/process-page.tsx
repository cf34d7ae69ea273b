import { CharacterisationPanel } from '../../features/characterisation/components/characterisation-panel';
import ProcessRoute from '../../features/processes/routes/process-route';

/** A process profile page composes the library's view of a version with the characterisation of its model card. */
export default function ProcessPage() {
  return <ProcessRoute characterisation={(props) => <CharacterisationPanel {...props} />} />;
}
