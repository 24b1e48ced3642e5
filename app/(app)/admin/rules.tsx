import { RulesPanel } from '@/components/settings/rules-panel';

export default function RulesScreen() {
  return <RulesPanel />;
}
