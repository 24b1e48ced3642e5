import { Redirect } from 'expo-router';
import { ADMIN_SECTIONS } from '@/constants/navigation';

export default function AdminHome() {
  return <Redirect href={ADMIN_SECTIONS[0].href as never} />;
}
