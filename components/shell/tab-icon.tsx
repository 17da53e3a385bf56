import { StyleSheet, View } from 'react-native';

export type TabIconName = 'materials' | 'designs' | 'runs' | 'growth' | 'team' | 'outbox' | 'system';

/**
 * Navigation icons drawn with views: stacked zones (materials), a graded
 * leg between plates (designs), a start triangle (runs), a crystal on its
 * seed rod (growth), two people (team), an envelope (outbox) and a gauge
 * (system). 24 × 24 px, one colour.
 */
export function TabIcon({ name, color }: { name: TabIconName; color: string }) {
  return (
    <View style={styles.box} aria-hidden>
      {name === 'materials' ? <Layers color={color} /> : null}
      {name === 'designs' ? <Leg color={color} /> : null}
      {name === 'runs' ? <Play color={color} /> : null}
      {name === 'growth' ? <Crystal color={color} /> : null}
      {name === 'team' ? <People color={color} /> : null}
      {name === 'outbox' ? <Envelope color={color} /> : null}
      {name === 'system' ? <Gauge color={color} /> : null}
    </View>
  );
}

function Layers({ color }: { color: string }) {
  return (
    <View style={styles.layers}>
      <View style={[styles.layer, styles.layerTop, { backgroundColor: color }]} />
      <View style={[styles.layer, styles.layerMid, { backgroundColor: color }]} />
      <View style={[styles.layer, { backgroundColor: color }]} />
    </View>
  );
}

function Person({ color, style }: { color: string; style: object }) {
  return (
    <View style={[styles.person, style]}>
      <View style={[styles.head, { backgroundColor: color }]} />
      <View style={[styles.shoulders, { backgroundColor: color }]} />
    </View>
  );
}

function People({ color }: { color: string }) {
  return (
    <View style={styles.people}>
      <Person color={color} style={styles.behind} />
      <Person color={color} style={styles.front} />
    </View>
  );
}

/** A leg between its cold and hot plates, zones stepping down the leg. */
function Leg({ color }: { color: string }) {
  return (
    <View style={styles.legIcon}>
      <View style={[styles.plate, { backgroundColor: color }]} />
      <View style={[styles.legZone, styles.zoneFaint, { backgroundColor: color }]} />
      <View style={[styles.legZone, styles.zoneMid, { backgroundColor: color }]} />
      <View style={[styles.legZone, { backgroundColor: color }]} />
      <View style={[styles.plate, { backgroundColor: color }]} />
    </View>
  );
}

/** A run: a start triangle beside a progress line. */
function Play({ color }: { color: string }) {
  return (
    <View style={styles.play}>
      <View style={[styles.triangle, { borderLeftColor: color }]} />
      <View style={[styles.track, { backgroundColor: color }]} />
    </View>
  );
}

/** A grown crystal hanging from its seed rod, zones banded along it. */
function Crystal({ color }: { color: string }) {
  return (
    <View style={styles.crystal}>
      <View style={[styles.seed, { backgroundColor: color }]} />
      <View style={[styles.boule, { borderColor: color }]}>
        <View style={[styles.band, styles.zoneFaint, { backgroundColor: color }]} />
        <View style={[styles.band, { backgroundColor: color }]} />
      </View>
    </View>
  );
}

function Envelope({ color }: { color: string }) {
  return (
    <View style={[styles.envelope, { borderColor: color }]}>
      <View style={[styles.flap, { borderColor: color }]} />
    </View>
  );
}

function Gauge({ color }: { color: string }) {
  return (
    <View style={[styles.gauge, { borderColor: color }]}>
      <View style={[styles.needle, { backgroundColor: color }]} />
      <View style={[styles.hub, { backgroundColor: color }]} />
    </View>
  );
}

const styles = StyleSheet.create({
  box: { width: 24, height: 24, alignItems: 'center', justifyContent: 'center' },
  layers: { width: 20, gap: 3, alignItems: 'center' },
  layer: { height: 4, width: 20, borderRadius: 1 },
  layerMid: { width: 16, opacity: 0.8 },
  layerTop: { width: 12, opacity: 0.6 },
  people: { width: 22, height: 20 },
  person: { position: 'absolute', alignItems: 'center', gap: 1 },
  behind: { left: 0, top: 0, opacity: 0.6 },
  front: { right: 0, top: 2 },
  head: { width: 7, height: 7, borderRadius: 4 },
  shoulders: { width: 12, height: 8, borderTopLeftRadius: 6, borderTopRightRadius: 6 },
  legIcon: { width: 20, alignItems: 'center', gap: 1 },
  plate: { width: 20, height: 3, borderRadius: 1 },
  legZone: { width: 8, height: 4 },
  zoneFaint: { opacity: 0.45 },
  zoneMid: { opacity: 0.7 },
  play: { width: 22, flexDirection: 'row', alignItems: 'center', gap: 2 },
  triangle: {
    width: 0,
    height: 0,
    borderLeftWidth: 11,
    borderTopWidth: 8,
    borderBottomWidth: 8,
    borderTopColor: 'transparent',
    borderBottomColor: 'transparent',
  },
  track: { flex: 1, height: 3, borderRadius: 1 },
  crystal: { width: 20, alignItems: 'center' },
  seed: { width: 2, height: 4 },
  boule: {
    width: 12,
    height: 17,
    borderWidth: 2,
    borderTopLeftRadius: 3,
    borderTopRightRadius: 3,
    borderBottomLeftRadius: 6,
    borderBottomRightRadius: 6,
    justifyContent: 'space-evenly',
    alignItems: 'center',
  },
  band: { width: 8, height: 2 },
  envelope: {
    width: 20,
    height: 15,
    borderWidth: 2,
    borderRadius: 2,
    alignItems: 'center',
    overflow: 'hidden',
  },
  flap: {
    width: 12,
    height: 12,
    marginTop: -8,
    borderRightWidth: 2,
    borderBottomWidth: 2,
    transform: [{ rotate: '45deg' }],
  },
  gauge: {
    width: 20,
    height: 20,
    borderRadius: 10,
    borderWidth: 2,
    alignItems: 'center',
    justifyContent: 'center',
  },
  needle: {
    position: 'absolute',
    width: 2,
    height: 7,
    top: 3,
    left: 10,
    transform: [{ rotate: '40deg' }],
  },
  hub: { width: 4, height: 4, borderRadius: 2 },
});
