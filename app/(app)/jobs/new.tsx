import { NewJobScreen } from '@/components/jobs/new-job-screen';

export default function NewJobRoute() {
  return <NewJobScreen />;
}
