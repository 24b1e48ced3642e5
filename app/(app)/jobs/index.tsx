import { JobsListScreen } from '@/components/jobs/jobs-list-screen';

export default function JobsRoute() {
  return <JobsListScreen />;
}
