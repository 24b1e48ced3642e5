import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { isMissingFacts } from '@/shared/rules/define-rule';
import type { CheckResult } from '@/shared/rules/types';
import { spacing } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { DecorativeIcon } from '@/components/ui/decorative-icon';
import { verdictWords } from './verdict-words';

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

/** The answer in one line: word and icon (never colour alone), with the counts under it. */
export function VerdictBanner({ result }: { result: CheckResult }) {
  const theme = useTandemTheme();
  const { word, icon, tone } = verdictWords(result);
  const bg = { blocker: theme.status.blockerContainer, caution: theme.status.cautionContainer, info: theme.status.infoContainer, ok: theme.status.okContainer }[tone];
  const fg = { blocker: theme.status.blocker, caution: theme.status.caution, info: theme.status.info, ok: theme.status.ok }[tone];
  // "Facts not given" notes are counted as not checked, as the result lists them.
  const count = (s: string) => result.findings.filter((f) => f.severity === s && !isMissingFacts(f)).length;
  const notChecked = result.coverage.notChecked.length;
  return (
    <View style={[styles.banner, { backgroundColor: bg, borderColor: fg }]} accessibilityRole="alert" testID="verdict-banner">
      <DecorativeIcon source={icon} size={40} color={fg} />
      <View style={styles.words}>
        <Text variant="headlineSmall" style={{ color: theme.colors.onSurface }} testID="verdict-word">
          {word}
        </Text>
        <Text variant="bodyMedium" style={{ color: theme.colors.onSurface }}>
          {plural(count('blocker'), 'blocker')} · {plural(count('caution'), 'caution')} · {plural(count('info'), 'note')}
          {notChecked ? ` · ${notChecked} not checked` : ''}
        </Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  banner: { flexDirection: 'row', alignItems: 'center', gap: spacing.md, padding: spacing.lg, borderRadius: 14, borderWidth: 2 },
  words: { flex: 1, gap: 2 },
});
