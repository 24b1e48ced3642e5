import { AccountPanel } from '@/components/account/account-panel';

export default function AccountScreen() {
  return <AccountPanel />;
}
