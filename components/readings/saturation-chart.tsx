import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import Svg, { Circle, G, Line, Path, Rect, Text as SvgText } from 'react-native-svg';
import { spacing } from '@/constants/theme';
import { useTandemTheme } from '@/hooks/use-tandem-theme';
import { chartModel, type ChartReading } from './chart-geometry';
import { formatNumber } from './number-text';

const HEIGHT_PX = 240;
/** The app's own face (loaded by expo-font), so the axis labels match the screen. */
const FONT = 'Inter-Regular';

interface Props {
  refrigerant: string;
  altitudeFt: number;
  readings: ChartReading[];
}

/** Pressure against temperature, bubble (solid) and dew (dashed), with suction and liquid marked. */
export function SaturationChart({ refrigerant, altitudeFt, readings }: Props) {
  const theme = useTandemTheme();
  const [widthPx, setWidthPx] = useState(0);
  const model = useMemo(
    () => (widthPx > 0 ? chartModel(refrigerant, altitudeFt, readings, widthPx, HEIGHT_PX) : null),
    [refrigerant, altitudeFt, readings, widthPx],
  );
  const ink = theme.colors.onSurface;
  const faint = theme.colors.outlineVariant;
  const curve = theme.colors.primary;
  const markColor = { suction: theme.status.info, liquid: theme.colors.tertiary };
  const described = readings
    .map(
      (r) =>
        `${r.kind} ${formatNumber(r.psig)} psig saturates at ${formatNumber(r.satF)} °F${r.lineF === undefined ? '' : `, line at ${formatNumber(r.lineF)} °F`}`,
    )
    .join('; ');

  return (
    <View style={styles.box}>
      <View
        accessible
        accessibilityRole="image"
        accessibilityLabel={`Saturation curve of ${refrigerant}, pressure against temperature${described ? `: ${described}` : ''}`}
        onLayout={(e) => setWidthPx(Math.round(e.nativeEvent.layout.width))}
        style={{ height: HEIGHT_PX }}
        testID="saturation-chart"
      >
        {model ? (
          <Svg width={widthPx} height={HEIGHT_PX} aria-hidden>
            <Rect x={model.plot.left} y={model.plot.top} width={model.plot.width} height={model.plot.height} fill="none" stroke={faint} />
            {model.yTicks.map((t) => (
              <G key={`y${t.value}`}>
                <Line x1={model.plot.left} x2={model.plot.left + model.plot.width} y1={t.y} y2={t.y} stroke={faint} strokeWidth={0.5} />
                <SvgText fontFamily={FONT} x={model.plot.left - 6} y={t.y + 4} fontSize={11} fill={ink} textAnchor="end">
                  {String(t.value)}
                </SvgText>
              </G>
            ))}
            {model.xTicks.map((t) => (
              <G key={`x${t.value}`}>
                <Line x1={t.x} x2={t.x} y1={model.plot.top} y2={model.plot.top + model.plot.height} stroke={faint} strokeWidth={0.5} />
                <SvgText fontFamily={FONT} x={t.x} y={model.plot.top + model.plot.height + 16} fontSize={11} fill={ink} textAnchor="middle">
                  {String(t.value)}
                </SvgText>
              </G>
            ))}
            <SvgText fontFamily={FONT} x={model.plot.left + model.plot.width} y={HEIGHT_PX - 2} fontSize={11} fill={ink} textAnchor="end">
              °F
            </SvgText>
            <SvgText fontFamily={FONT} x={model.plot.left - 6} y={12} fontSize={11} fill={ink} textAnchor="end">
              psig
            </SvgText>
            <Path d={model.bubblePath} stroke={curve} strokeWidth={2.5} fill="none" />
            <Path d={model.dewPath} stroke={curve} strokeWidth={2} strokeDasharray="6 4" fill="none" />
            {model.marks.map((m) => (
              <G key={m.kind}>
                {m.line ? <Line x1={m.sat.x} x2={m.line.x} y1={m.sat.y} y2={m.line.y} stroke={markColor[m.kind]} strokeWidth={3} /> : null}
                <Circle cx={m.sat.x} cy={m.sat.y} r={5} fill={markColor[m.kind]} />
                {m.line ? (
                  <Circle cx={m.line.x} cy={m.line.y} r={6} fill={theme.colors.surface} stroke={markColor[m.kind]} strokeWidth={3} />
                ) : null}
                <SvgText
                  fontFamily={FONT}
                  x={(m.line ?? m.sat).x + (m.kind === 'suction' ? 10 : -10)}
                  y={m.sat.y - 8}
                  fontSize={12}
                  fontWeight="bold"
                  fill={ink}
                  textAnchor={m.kind === 'suction' ? 'start' : 'end'}
                >
                  {m.kind === 'suction' ? 'Suction' : 'Liquid'}
                </SvgText>
              </G>
            ))}
          </Svg>
        ) : null}
      </View>
      <Text variant="bodySmall">
        Solid line: bubble point. Dashed: dew point. A dot on the curve is the gauge's saturation; the ring is the line thermometer — the
        gap between them is the superheat (suction) or subcooling (liquid).
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({ box: { gap: spacing.xs } });
