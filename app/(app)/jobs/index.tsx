import { JobList } from '@/components/jobs/job-list';

/** /jobs: search and list jobs. */
export default function JobsScreen() {
  return <JobList />;
}
