import { useNavigate, useSearchParams } from 'react-router-dom';
import { PageHeader } from '../../../components/page-header';
import { PageLoader } from '../../../components/page-loader';
import { useCreateProcess } from '../api/create-process';
import { useProcess } from '../../../lib/processes/process';
import { ProcessEditorForm } from '../components/process-editor-form';
import { blankFormValues, toFormValues } from '../utils/process-form-values';

/** /processes/new (maintainers): a new profile, blank or (?from=id&version=n) a copy of another's version. */
export default function ProcessNewRoute() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const from = params.get('from') ?? '';
  const version = Number(params.get('version')) || undefined;
  const source = useProcess(from, version);
  const create = useCreateProcess();

  if (from && source.isPending) return <PageLoader label="Loading the profile to copy" />;
  const initialValues =
    from && source.data ? { ...toFormValues(source.data.version.definition, source.data.nodeClass), name: `${source.data.name} copy` } : blankFormValues();

  return (
    <>
      <PageHeader
        title="New process profile"
        description={from && source.data ? `A copy of ${source.data.name} v${source.data.version.number}.` : 'Enter the numbers of one process; they become its version 1.'}
      />
      <ProcessEditorForm
        initialValues={initialValues}
        pending={create.isPending}
        error={create.error}
        onCancel={() => navigate('/processes')}
        onSave={({ definition, nodeClass, message }) =>
          create.mutate({ definition, nodeClass, message }, { onSuccess: (profile) => void navigate(`/processes/${profile.id}`) })
        }
      />
    </>
  );
}
