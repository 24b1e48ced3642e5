import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import Svg, { G, Line, Rect, Text as SvgText } from 'react-native-svg';
import { spacing } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { costBarsModel, type CostBar } from './cost-bars-geometry';
import { moneyText } from './option-words';

const FONT = 'Inter-Regular';
const FONT_BOLD = 'Inter-SemiBold';

/** Annual energy cost per option beside the existing system, as horizontal bars from zero. */
export function CostBars({ entries }: { entries: CostBar[] }) {
  const theme = useTandemTheme();
  const [widthPx, setWidthPx] = useState(0);
  const model = useMemo(() => (widthPx > 0 ? costBarsModel(entries, widthPx) : null), [entries, widthPx]);
  const ink = theme.colors.onSurface;
  const faint = theme.colors.outlineVariant;
  const described = entries.map((e) => `${e.label}: ${e.valueCents === null ? 'not worked out' : `${moneyText(e.valueCents, 0)} a year`}`).join('; ');

  return (
    <View style={styles.box}>
      <View
        accessible
        accessibilityRole="image"
        accessibilityLabel={`Annual energy cost. ${described}`}
        onLayout={(e) => setWidthPx(Math.round(e.nativeEvent.layout.width))}
        style={{ minHeight: model?.heightPx ?? 80 }}
        testID="cost-bars"
      >
        {model ? (
          <Svg width={widthPx} height={model.heightPx} aria-hidden>
            {model.ticks.map((t) => (
              <G key={t.cents}>
                <Line x1={t.x} x2={t.x} y1={0} y2={model.heightPx - 18} stroke={faint} strokeWidth={0.75} />
                <SvgText fontFamily={FONT} x={t.x} y={model.heightPx - 4} fontSize={11} fill={ink} textAnchor={t.x < 20 ? 'start' : t.x > widthPx - 30 ? 'end' : 'middle'}>
                  {moneyText(t.cents, 0)}
                </SvgText>
              </G>
            ))}
            {model.bars.map((b, i) => {
              const fill = b.key === 'existing' ? theme.colors.outline : i % 2 ? theme.colors.tertiary : theme.colors.primary;
              const value = b.valueCents === null ? 'not worked out' : `${moneyText(b.valueCents, 0)} a year`;
              const inside = b.barWidth > widthPx * 0.55;
              return (
                <G key={b.key}>
                  <SvgText fontFamily={FONT_BOLD} x={model.plot.left} y={b.labelY} fontSize={13} fill={ink}>
                    {b.label}
                  </SvgText>
                  <Rect x={model.plot.left} y={b.barY} width={Math.max(b.barWidth, 0)} height={b.barHeight} rx={3} fill={fill} />
                  <SvgText
                    fontFamily={FONT_BOLD}
                    x={inside ? model.plot.left + b.barWidth - 6 : model.plot.left + b.barWidth + 6}
                    y={b.barY + b.barHeight / 2 + 4}
                    fontSize={12}
                    fill={inside ? theme.colors.onPrimary : ink}
                    textAnchor={inside ? 'end' : 'start'}
                  >
                    {value}
                  </SvgText>
                </G>
              );
            })}
          </Svg>
        ) : null}
      </View>
      <Text variant="bodySmall">Bars start at zero, so their lengths compare directly. Grey is the existing system.</Text>
    </View>
  );
}

const styles = StyleSheet.create({ box: { gap: spacing.xs } });
