import { useLocalSearchParams } from 'expo-router';
import { RecordScreen } from '@/components/systems/record-screen';

export default function RecordRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <RecordScreen id={Number(id)} />;
}
