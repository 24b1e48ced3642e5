import { Redirect } from 'expo-router';
import { SignInForm } from '@/components/account/sign-in-form';
import { useSession } from '@/hooks/use-session';

export default function SignInScreen() {
  const { session, ready } = useSession();
  if (ready && session) return <Redirect href="/" />;
  return <SignInForm />;
}
