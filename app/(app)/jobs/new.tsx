import { Screen } from '@/components/screen';
import { ThemedText } from '@/components/themed-text';
import { JobForm } from '@/components/jobs/job-form';

/** /jobs/new: create a job. */
export default function NewJobScreen() {
  return (
    <Screen testID="job-new-screen">
      <ThemedText variant="title" accessibilityRole="header">
        New job
      </ThemedText>
      <JobForm />
    </Screen>
  );
}
