import { OutboxPanel } from '@/components/systems/outbox-panel';

export default function OutboxRoute() {
  return <OutboxPanel />;
}
