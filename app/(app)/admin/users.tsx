import { UsersPanel } from '@/components/admin/users-panel';

export default function UsersScreen() {
  return <UsersPanel />;
}
