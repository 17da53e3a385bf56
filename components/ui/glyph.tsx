import { StyleSheet, View } from 'react-native';

export type GlyphName =
  | 'check'
  | 'cross'
  | 'plus'
  | 'minus'
  | 'ring'
  | 'bang'
  | 'lock'
  | 'chevron-down'
  | 'chevron-right'
  | 'chevron-left';

export type GlyphProps = {
  name: GlyphName;
  color: string;
  /** Accessible text; omit when a visible word next to the glyph says the same. */
  label?: string;
};

/**
 * 16-px glyphs drawn with plain views, so they need no icon font and look
 * the same on web, in tests and on devices. They always sit next to a word.
 */
export function Glyph({ name, color, label }: GlyphProps) {
  return (
    <View
      style={styles.box}
      accessible={label !== undefined}
      accessibilityLabel={label}
      aria-hidden={label === undefined}
    >
      {renderGlyph(name, color)}
    </View>
  );
}

function renderGlyph(name: GlyphName, color: string) {
  switch (name) {
    case 'check':
      return <View style={[styles.check, { borderColor: color }]} />;
    case 'cross':
      return (
        <>
          <View style={[styles.bar, styles.turnLeft, { backgroundColor: color }]} />
          <View style={[styles.bar, styles.turnRight, { backgroundColor: color }]} />
        </>
      );
    case 'plus':
      return (
        <>
          <View style={[styles.bar, { backgroundColor: color }]} />
          <View style={[styles.bar, styles.upright, { backgroundColor: color }]} />
        </>
      );
    case 'minus':
      return <View style={[styles.bar, { backgroundColor: color }]} />;
    case 'ring':
      return <View style={[styles.ring, { borderColor: color }]} />;
    case 'bang':
      return (
        <>
          <View style={[styles.bangStem, { backgroundColor: color }]} />
          <View style={[styles.bangDot, { backgroundColor: color }]} />
        </>
      );
    case 'lock':
      return (
        <>
          <View style={[styles.shackle, { borderColor: color }]} />
          <View style={[styles.lockBody, { backgroundColor: color }]} />
        </>
      );
    case 'chevron-left':
      return <View style={[styles.chevron, styles.pointLeft, { borderColor: color }]} />;
    case 'chevron-down':
      return <View style={[styles.chevron, styles.pointDown, { borderColor: color }]} />;
    case 'chevron-right':
      return <View style={[styles.chevron, styles.pointRight, { borderColor: color }]} />;
  }
}

const stroke = 2;

const styles = StyleSheet.create({
  box: { width: 16, height: 16, alignItems: 'center', justifyContent: 'center' },
  check: {
    width: 6,
    height: 11,
    marginTop: -3,
    borderRightWidth: stroke,
    borderBottomWidth: stroke,
    transform: [{ rotate: '45deg' }],
  },
  bar: { position: 'absolute', width: 12, height: stroke, borderRadius: 1 },
  upright: { transform: [{ rotate: '90deg' }] },
  turnLeft: { transform: [{ rotate: '45deg' }] },
  turnRight: { transform: [{ rotate: '-45deg' }] },
  ring: { width: 11, height: 11, borderRadius: 6, borderWidth: stroke },
  chevron: { width: 7, height: 7, borderRightWidth: stroke, borderBottomWidth: stroke },
  pointDown: { marginTop: -3, transform: [{ rotate: '45deg' }] },
  pointRight: { marginLeft: -3, transform: [{ rotate: '-45deg' }] },
  pointLeft: { marginLeft: 3, transform: [{ rotate: '135deg' }] },
  bangStem: { position: 'absolute', top: 2, width: stroke, height: 8, borderRadius: 1 },
  bangDot: { position: 'absolute', bottom: 2, width: stroke + 0.5, height: stroke + 0.5, borderRadius: 2 },
  shackle: {
    position: 'absolute',
    top: 1,
    width: 8,
    height: 9,
    borderWidth: stroke,
    borderBottomWidth: 0,
    borderTopLeftRadius: 4,
    borderTopRightRadius: 4,
  },
  lockBody: { position: 'absolute', bottom: 1, width: 12, height: 8, borderRadius: 1.5 },
});
