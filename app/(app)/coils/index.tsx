import { Redirect } from 'expo-router';
import { CoilsScreen } from '@/components/coils/coils-screen';
import { useCurrentUser } from '@/hooks/use-session';

export default function CoilsRoute() {
  const user = useCurrentUser();
  // Prices stay with the office: a tech is sent home (the API answers 403 anyway).
  if (user.role === 'tech') return <Redirect href="/" />;
  return <CoilsScreen />;
}
