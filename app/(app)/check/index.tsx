import { CheckScreen } from '@/components/check/check-screen';

export default function CheckRoute() {
  return <CheckScreen />;
}
