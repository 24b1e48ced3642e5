import { Redirect } from 'expo-router';
import { navItemsFor } from '@/constants/navigation';
import { useCurrentUser } from '@/hooks/use-session';

/** Home is the first section the role has (Check for a tech once it exists). */
export default function Home() {
  const user = useCurrentUser();
  const first = navItemsFor(user.role)[0];
  return <Redirect href={(first?.href ?? '/account') as never} />;
}
