import { Select } from '@mantine/core';
import { useSignedInUser } from '../../../lib/session/current-user';
import { useReviewerCandidates } from '../api/get-reviewer-candidates';

interface ReviewerSelectProps {
  projectId: string;
  value: string | null;
  onChange: (userId: string | null) => void;
  error?: string;
}

/** The project's members who may review (reviewer or owner role), without the signed-in author. */
export function ReviewerSelect({ projectId, value, onChange, error }: ReviewerSelectProps) {
  const me = useSignedInUser();
  const candidates = useReviewerCandidates(projectId);
  const data = (candidates.data ?? []).filter((member) => member.userId !== me.id).map((member) => ({ value: member.userId, label: `${member.displayName} (${member.role})` }));
  return (
    <Select
      label="Reviewer"
      description="A member with the reviewer or owner role; never the author"
      placeholder={candidates.isPending ? 'Loading members…' : data.length === 0 ? 'Nobody in this project may review' : 'Choose a reviewer'}
      data={data}
      value={value}
      onChange={onChange}
      error={error}
      disabled={data.length === 0}
      searchable
    />
  );
}
