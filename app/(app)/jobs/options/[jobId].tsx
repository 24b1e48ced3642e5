import { Redirect, useLocalSearchParams } from 'expo-router';
import { OptionsScreen } from '@/components/options/options-screen';
import { useCurrentUser } from '@/hooks/use-session';

export default function JobOptionsRoute() {
  const { jobId } = useLocalSearchParams<{ jobId: string }>();
  const user = useCurrentUser();
  // Priced options stay with the office: a tech goes back to the job (the API answers 403 anyway).
  if (user.role === 'tech') return <Redirect href={`/jobs/${jobId}`} />;
  return <OptionsScreen jobId={Number(jobId)} />;
}
