import { isValidElement, type ReactElement } from 'react';
import { StyleSheet, View, type ViewStyle } from 'react-native';
import { useIsWide } from '@/components/shell/use-is-wide';
import { colors, radii, spacing } from '@/components/theme';
import { SideScroll, stickyLeft } from './side-scroll';
import { AppText } from './text';

/** What a cell shows: plain text, a value with a muted line under it, or an element of its own (a glyph). */
export type DataCell = string | { main: string; sub?: string } | ReactElement;

export type DataColumn<R> = {
  key: string;
  head: string;
  /** Unit or note under the head ("µV/K"); in cards it follows the head. */
  unit?: string;
  /** Width in px; the column never gets narrower. */
  width: number;
  /** Width on a phone when it differs (narrower, so the next column peeks in). */
  phoneWidth?: number;
  /** Share of spare width this column takes when the card is wider than the table (0: none). */
  grow?: number;
  align?: 'left' | 'right' | 'center';
  /** Numbers in the monospaced face. */
  mono?: boolean;
  cell: (row: R, index: number) => DataCell;
};

export type DataTableProps<R> = {
  /** Read out as the table's name. */
  label: string;
  columns: readonly DataColumn<R>[];
  rows: readonly R[];
  rowKey: (row: R, index: number) => string;
  testID?: string;
  rowTestID?: (row: R, index: number) => string | undefined;
  /**
   * How a phone shows it. `scroll` (many numeric columns): the table scrolls
   * inside its card with a cue, its first column held at the left edge.
   * `cards` (few columns, wordy cells): one labelled card per row, the first
   * column as the card's title.
   */
  phone?: 'scroll' | 'cards';
  /** The first column's cells are row headers (a quantity's name) rather than plain cells. Held at the left either way. */
  rowHeaders?: boolean;
  /** The card colour behind the table, so the held column and the fade cover what scrolls under them. */
  surface?: string;
};

type CellLook = { value: DataCell; mono?: boolean; strong?: boolean; align?: 'left' | 'right' | 'center' };

function CellContent({ value, mono, strong, align }: CellLook) {
  if (isValidElement(value)) return value;
  const text = typeof value === 'string' ? { main: value, sub: undefined } : (value as { main: string; sub?: string });
  const alignStyle = align ? { textAlign: align } : null;
  return (
    <>
      <AppText variant={strong ? 'bodyStrong' : mono ? 'mono' : 'body'} style={alignStyle}>
        {text.main}
      </AppText>
      {text.sub ? (
        <AppText variant="caption" tone="muted" style={alignStyle}>
          {text.sub}
        </AppText>
      ) : null}
    </>
  );
}

/**
 * The app's one table: data-driven (a column list and a row list), laid out
 * as a table on a wide window, and on a phone as a table that scrolls
 * inside its card (with a cue, first column held) or as labelled cards.
 * Keeps `table`, `row`, `columnheader`, `rowheader` and `cell` roles.
 */
export function DataTable<R>(props: DataTableProps<R>) {
  const wide = useIsWide();
  if (!wide && props.phone === 'cards') return <DataCards {...props} />;
  return <ScrollingTable {...props} wide={wide} />;
}

function ScrollingTable<R>({ label, columns, rows, rowKey, testID, rowTestID, rowHeaders = false, surface = colors.surface, wide }: DataTableProps<R> & { wide: boolean }) {
  const columnWidth = (c: DataColumn<R>) => (wide ? c.width : (c.phoneWidth ?? c.width));
  const cellBox = (c: DataColumn<R>, i: number): ViewStyle[] => {
    const width = columnWidth(c);
    const box: ViewStyle[] = [styles.cell, { flexBasis: width, minWidth: width, flexGrow: c.grow ?? 0 }];
    if (i === 0 && stickyLeft) box.push(stickyLeft, { backgroundColor: surface });
    return box;
  };
  return (
    <SideScroll surface={surface} contentWidth={columns.reduce((sum, c) => sum + columnWidth(c), 0)} testID={testID ? `${testID}-scroll` : undefined}>
      <View role="table" aria-label={label} testID={testID} style={styles.table}>
        <View role="row" style={[styles.row, styles.headRow]}>
          {columns.map((c, i) => (
            <View key={c.key} role="columnheader" style={cellBox(c, i)}>
              <AppText variant="label" style={c.align ? { textAlign: c.align } : null}>
                {c.head}
              </AppText>
              {c.unit !== undefined ? (
                <AppText variant="caption" tone="muted" style={c.align ? { textAlign: c.align } : null}>
                  {c.unit || ' '}
                </AppText>
              ) : null}
            </View>
          ))}
        </View>
        {rows.map((r, ri) => (
          <View key={rowKey(r, ri)} role="row" style={styles.row} testID={rowTestID?.(r, ri)}>
            {columns.map((c, i) => (
              <View key={c.key} role={i === 0 && rowHeaders ? 'rowheader' : 'cell'} style={cellBox(c, i)}>
                <CellContent value={c.cell(r, ri)} mono={c.mono} align={c.align} />
              </View>
            ))}
          </View>
        ))}
      </View>
    </SideScroll>
  );
}

function headWithUnit(c: { head: string; unit?: string }): string {
  return c.unit && c.unit !== '–' ? `${c.head} (${c.unit})` : c.head;
}

/** One card per row: the first column is the title, every other column a "head (unit)" line with its value. */
function DataCards<R>({ label, columns, rows, rowKey, testID, rowTestID }: DataTableProps<R>) {
  const [title, ...rest] = columns;
  return (
    <View role="table" aria-label={label} testID={testID} style={styles.cards}>
      {rows.map((r, ri) => (
        <View key={rowKey(r, ri)} role="row" style={styles.card} testID={rowTestID?.(r, ri)}>
          <View role="rowheader" style={styles.cardTitle}>
            <CellContent value={title.cell(r, ri)} strong />
          </View>
          {rest.map((c) => {
            const value = c.cell(r, ri);
            // A line with nothing to say is left out (a table keeps its empty cell to hold the column).
            if (value === '') return null;
            return (
              <View key={c.key} role="cell" style={styles.cardLine}>
                <AppText variant="caption" tone="muted" style={styles.cardTerm}>
                  {headWithUnit(c)}
                </AppText>
                <View style={styles.cardValue}>
                  <CellContent value={value} mono={c.mono} />
                </View>
              </View>
            );
          })}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  table: { width: '100%' },
  row: { flexDirection: 'row', borderTopWidth: 1, borderTopColor: colors.border },
  headRow: { borderTopWidth: 0 },
  cell: { paddingVertical: spacing.xs, paddingRight: spacing.sm, gap: spacing.xxs, justifyContent: 'center' },
  cards: { gap: spacing.sm },
  card: { gap: spacing.xs, padding: spacing.md, borderWidth: 1, borderColor: colors.border, borderRadius: radii.md, backgroundColor: colors.background },
  cardTitle: { paddingBottom: spacing.xxs },
  cardLine: { flexDirection: 'row', gap: spacing.sm },
  cardTerm: { width: 120, paddingTop: 2 },
  cardValue: { flex: 1, minWidth: 0 },
});
