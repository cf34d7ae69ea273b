import { PageHeader } from '../../../components/page-header';
import { useSignedInUser } from '../../../lib/session/current-user';
import { ProjectsSection } from '../components/projects-section';

export default function HomeRoute() {
  const user = useSignedInUser();
  return (
    <>
      <PageHeader
        title={`Welcome, ${user.displayName}`}
        description="Your sizing work, its reviews and sign-offs start here."
      />
      <ProjectsSection />
    </>
  );
}
