import { ImportsPanel } from '@/components/imports/imports-panel';

export default function ImportsScreen() {
  return <ImportsPanel />;
}
