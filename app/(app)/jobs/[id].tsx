import { useLocalSearchParams } from 'expo-router';
import { JobPage } from '@/components/jobs/job-page';

/** /jobs/:id: the job, its walks, and starting a walk. */
export default function JobScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <JobPage id={/^\d+$/.test(id ?? '') ? Number(id) : 0} />;
}
