import { useLocalSearchParams } from 'expo-router';
import { JobDetailScreen } from '@/components/jobs/job-detail-screen';

export default function JobRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <JobDetailScreen id={Number(id)} />;
}
