import { Redirect, Slot } from 'expo-router';
import { AdminSectionBar } from '@/components/admin/admin-section-bar';
import { useCurrentUser } from '@/hooks/use-session';
import { View } from 'react-native';

/** Admin area: admins only; a row of sections above the content. */
export default function AdminLayout() {
  const user = useCurrentUser();
  if (user.role !== 'admin') return <Redirect href="/" />;
  return (
    <View style={{ flex: 1 }}>
      <AdminSectionBar />
      <View style={{ flex: 1 }}>
        <Slot />
      </View>
    </View>
  );
}
