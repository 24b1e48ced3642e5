import { ReadingsScreen } from '@/components/readings/readings-screen';

export default function ReadingsRoute() {
  return <ReadingsScreen />;
}
