import { lazy, Suspense } from 'react';
import { PageLoader } from '../../components/page-loader';
import ProcessRoute from '../../features/processes/routes/process-route';

// The characterisation panel plans the default grid with the device engine: it loads after the profile itself.
const CharacterisationPanel = lazy(() => import('../../features/characterisation/components/characterisation-panel').then((module) => ({ default: module.CharacterisationPanel })));

/** A process profile page composes the library's view of a version with the characterisation of its model card. */
export default function ProcessPage() {
  return (
    <ProcessRoute
      characterisation={(props) => (
        <Suspense fallback={<PageLoader label="Loading the characterisation" />}>
          <CharacterisationPanel {...props} />
        </Suspense>
      )}
    />
  );
}
