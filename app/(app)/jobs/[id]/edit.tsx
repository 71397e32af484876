import { useLocalSearchParams } from 'expo-router';
import { JobEditPage } from '@/components/jobs/job-edit-page';

/** /jobs/:id/edit: change a job. */
export default function EditJobScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <JobEditPage id={/^\d+$/.test(id ?? '') ? Number(id) : 0} />;
}
