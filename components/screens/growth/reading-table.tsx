import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { InferredPointView, ReadingView } from '@/shared/api/growth-documents';
import { useIsWide } from '@/components/shell/use-is-wide';
import { colors, radii, spacing } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Glyph } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';
import { mm, zoneName } from './growth-format';
import { isOutside, pointVerdict, readingBand, readingValue, readingVerdict } from './reading-words';

/** Up to this many positions are listed at once; beyond, the flagged ones first and a button for the rest. */
const SHOWN = 12;

type Cell = { main: string; sub: string; flagged: boolean };
type Column = { key: string; head: string; flex: number; cell: (p: InferredPointView) => Cell };

function readingCell(p: InferredPointView, kind: ReadingView['kind']): Cell {
  const r = p.readings?.find((x) => x.kind === kind);
  if (!r) return { main: '–', sub: '', flagged: false };
  return { main: readingValue(r), sub: `${readingVerdict(r)} ${readingBand(r)}`, flagged: r.verdict !== 'within' };
}

/** The columns follow what was uploaded: a Hall column only when some position has a Hall reading. */
function columns(points: InferredPointView[]): Column[] {
  const has = (kind: ReadingView['kind']) => points.some((p) => p.readings?.some((r) => r.kind === kind));
  const cols: Column[] = [
    { key: 'position', head: 'Position', flex: 0.9, cell: (p) => ({ main: mm(p.positionMm), sub: `line ${p.line}`, flagged: false }) },
    { key: 'zone', head: 'Zone', flex: 0.6, cell: (p) => ({ main: p.zone === undefined ? '–' : String(p.zone + 1), sub: '', flagged: false }) },
  ];
  if (has('seebeck')) cols.push({ key: 'seebeck', head: 'Seebeck S', flex: 1.3, cell: (p) => readingCell(p, 'seebeck') });
  if (has('sigma')) cols.push({ key: 'sigma', head: 'Conductivity σ', flex: 1.3, cell: (p) => readingCell(p, 'sigma') });
  if (has('hall')) cols.push({ key: 'hall', head: 'Hall n (r_H applied)', flex: 1.5, cell: (p) => readingCell(p, 'hall') });
  cols.push({ key: 'verdict', head: 'Verdict', flex: 1.2, cell: (p) => ({ main: pointVerdict(p) ?? '–', sub: '', flagged: isOutside(p) }) });
  return cols;
}

function Value({ cell }: { cell: Cell }) {
  return (
    <>
      <AppText variant={cell.flagged ? 'bodyStrong' : 'body'} style={cell.flagged ? styles.flagged : undefined}>
        {cell.main}
      </AppText>
      {cell.sub ? <AppText variant="caption" tone={cell.flagged ? 'default' : 'muted'}>{cell.sub}</AppText> : null}
    </>
  );
}

export type ReadingTableProps = { points: InferredPointView[] };

/**
 * Every measured position with each reading against its zone's band and a
 * verdict in words (the mark and the bold type only repeat it). A table on
 * wide screens, one card per position on a phone.
 */
export function ReadingTable({ points }: ReadingTableProps) {
  const wide = useIsWide();
  const [all, setAll] = useState(false);
  const sorted = [...points].sort((a, b) => a.positionMm - b.positionMm);
  const outside = sorted.filter(isOutside);
  // Flagged positions are never hidden behind the button.
  const shown = all || sorted.length <= SHOWN ? sorted : [...outside, ...sorted.filter((p) => !isOutside(p)).slice(0, Math.max(0, SHOWN - outside.length))].sort((a, b) => a.positionMm - b.positionMm);
  const cols = columns(points);
  const more = sorted.length - shown.length;
  const mark = (p: InferredPointView) => (isOutside(p) ? <Glyph name="bang" color={colors.danger} /> : null);
  return (
    <View style={styles.wrap}>
      {wide ? (
        <View role="table" aria-label="Measured positions" testID="reading-table">
          <View role="row" style={[styles.row, styles.head]}>
            {cols.map((c) => (
              <AppText key={c.key} role="columnheader" variant="label" style={[styles.cell, { flex: c.flex }]}>
                {c.head}
              </AppText>
            ))}
          </View>
          {shown.map((p) => (
            <View key={p.line} role="row" style={[styles.row, isOutside(p) && styles.rowFlagged]} testID={`reading-row-${p.line}`}>
              {cols.map((c) => (
                <View key={c.key} role="cell" style={[styles.cell, { flex: c.flex }, c.key === 'verdict' && styles.verdictCell]}>
                  {c.key === 'verdict' ? mark(p) : null}
                  <View style={styles.grow}>
                    <Value cell={c.cell(p)} />
                  </View>
                </View>
              ))}
            </View>
          ))}
        </View>
      ) : (
        <View style={styles.cards} role="list" aria-label="Measured positions" testID="reading-table">
          {shown.map((p) => (
            <View key={p.line} role="listitem" style={[styles.card, isOutside(p) && styles.cardFlagged]} testID={`reading-row-${p.line}`}>
              <View style={styles.cardHead}>
                <AppText variant="bodyStrong">{`${mm(p.positionMm)}${p.zone === undefined ? '' : ` · ${zoneName(p.zone)}`}`}</AppText>
                <View style={styles.grow} />
                {mark(p)}
                <AppText variant="label" style={isOutside(p) ? styles.flagged : undefined}>{pointVerdict(p) ?? ''}</AppText>
              </View>
              {cols.filter((c) => !['position', 'zone', 'verdict'].includes(c.key)).map((c) => (
                <View key={c.key} style={styles.cardLine}>
                  <AppText variant="caption" tone="muted" style={styles.cardTerm}>
                    {c.head}
                  </AppText>
                  <View style={styles.grow}>
                    <Value cell={c.cell(p)} />
                  </View>
                </View>
              ))}
            </View>
          ))}
        </View>
      )}
      {more > 0 ? <Button variant="quiet" label={`Show all ${sorted.length} positions (${more} more, all within band)`} onPress={() => setAll(true)} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  row: { flexDirection: 'row', borderTopWidth: 1, borderTopColor: colors.border },
  rowFlagged: { backgroundColor: colors.dangerSoft },
  head: { borderTopWidth: 0, borderBottomWidth: 2, borderBottomColor: colors.text },
  cell: { paddingVertical: spacing.xs, paddingRight: spacing.sm, gap: spacing.xxs },
  verdictCell: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.xs },
  grow: { flex: 1 },
  flagged: { color: colors.danger },
  cards: { gap: spacing.sm },
  card: { gap: spacing.xs, padding: spacing.md, borderWidth: 1, borderColor: colors.border, borderRadius: radii.md, backgroundColor: colors.background },
  cardFlagged: { borderColor: colors.danger, borderWidth: 2 },
  cardHead: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.xs },
  cardLine: { flexDirection: 'row', gap: spacing.sm },
  cardTerm: { width: 112, paddingTop: 2 },
});
