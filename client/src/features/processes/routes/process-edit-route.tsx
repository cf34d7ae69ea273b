import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useNavigate, useParams } from 'react-router-dom';
import { ErrorPanel } from '../../../components/error-panel';
import { PageHeader } from '../../../components/page-header';
import { PageLoader } from '../../../components/page-loader';
import { useProcess } from '../../../lib/processes/process';
import { processKeys } from '../../../lib/processes/process-keys';
import { useUpdateProcess } from '../api/update-process';
import { ProcessCautions } from '../components/process-cautions';
import { ProcessEditorForm } from '../components/process-editor-form';
import { toFormValues } from '../utils/process-form-values';

/** /processes/:id/edit (maintainers): edits the latest version into a new one. */
export default function ProcessEditRoute() {
  const { id = '' } = useParams();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const profile = useProcess(id);
  const update = useUpdateProcess();
  // Bumped to rebuild the form from the latest version after a stale edit.
  const [generation, setGeneration] = useState(0);

  if (profile.isPending) return <PageLoader label="Loading the process profile" />;
  if (profile.isError) return <ErrorPanel title="The process profile could not be loaded" message={profile.error.message} onRetry={() => void profile.refetch()} />;
  const { data } = profile;

  const reloadLatest = async () => {
    await queryClient.invalidateQueries({ queryKey: processKeys.all });
    update.reset();
    setGeneration((g) => g + 1);
  };

  return (
    <>
      <PageHeader title={`Edit ${data.name}`} description={`Editing version ${data.version.number}; saving adds version ${data.version.number + 1} and keeps every earlier one.`} />
      <ProcessCautions demoData={data.demoData} />
      <ProcessEditorForm
        key={`${data.version.number}-${generation}`}
        initialValues={toFormValues(data.version.definition, data.nodeClass)}
        baseVersion={data.version.number}
        pending={update.isPending}
        error={update.error}
        onCancel={() => navigate(`/processes/${id}`)}
        onReloadLatest={() => void reloadLatest()}
        onSave={({ definition, nodeClass, message }) =>
          update.mutate(
            { id, request: { baseVersion: data.version.number, definition, nodeClass, message } },
            { onSuccess: () => void navigate(`/processes/${id}`) },
          )
        }
      />
    </>
  );
}
