import { ActivityIndicator } from 'react-native';
import { useJob } from '@/hooks/use-jobs';
import { Screen } from '@/components/screen';
import { ThemedText } from '@/components/themed-text';
import { Notice } from '@/components/notice';
import { colors } from '@/components/theme';
import { JobForm } from './job-form';

/** Loads a job and shows its form. */
export function JobEditPage({ id }: { id: number }) {
  const job = useJob(id);
  return (
    <Screen testID="job-edit-screen">
      <ThemedText variant="title" accessibilityRole="header">
        {job.data ? `Edit RO ${job.data.roNumber}` : 'Edit job'}
      </ThemedText>
      {job.isPending ? (
        <ActivityIndicator color={colors.accent} />
      ) : job.isError ? (
        <Notice tone="error" title="Could not open the job">{job.error.message}</Notice>
      ) : (
        <JobForm job={job.data} />
      )}
    </Screen>
  );
}
