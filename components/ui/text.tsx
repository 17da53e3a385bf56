import { Text, type TextProps, StyleSheet } from 'react-native';
import { colors, type as typeScale } from '@/components/theme';

export type TextVariant = keyof typeof typeScale;
export type TextTone = 'default' | 'muted' | 'faint' | 'primary' | 'heat' | 'ok' | 'danger' | 'inverse';

export type AppTextProps = TextProps & {
  variant?: TextVariant;
  tone?: TextTone;
};

/** Text in the type scale; `mono*` variants are for numbers, ids and units. */
export function AppText({ variant = 'body', tone = 'default', style, ...rest }: AppTextProps) {
  return <Text {...rest} style={[typeScale[variant], toneStyles[tone], style]} />;
}

const toneStyles = StyleSheet.create({
  default: { color: colors.text },
  muted: { color: colors.textMuted },
  faint: { color: colors.textFaint },
  primary: { color: colors.primary },
  heat: { color: colors.heat },
  ok: { color: colors.ok },
  danger: { color: colors.danger },
  inverse: { color: colors.chromeTextActive },
});
