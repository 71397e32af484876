import { useMemo, useState, type ReactNode } from 'react';
import { Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';
import {
  createSortedRowModel,
  rowSortingFeature,
  sortFn_alphanumeric,
  sortFn_basic,
  tableFeatures,
  useTable,
  type ColumnDef,
  type SortingState,
} from '@tanstack/react-table';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';

/** One column: a heading, the value it sorts by, and how to show it. */
export interface TableColumn<R> {
  id: string;
  header: string;
  value: (row: R) => string | number;
  render?: (row: R) => ReactNode;
  numeric?: boolean;
  /** On a phone, this column is the card's title rather than a labelled line. */
  primary?: boolean;
}

interface Props<R extends object> {
  columns: readonly TableColumn<R>[];
  rows: readonly R[];
  rowKey: (row: R) => string;
  /** Wide screens get a table; phones get a list of cards. */
  wide: boolean;
  initialSort?: SortingState;
  /** Opens the walks behind a row (drill-down); the row says so to screen readers. */
  onRowPress?: (row: R) => void;
  rowActionLabel?: (row: R) => string;
  /** Rows shown before "Show all". */
  limit?: number;
  testID: string;
}

// Sorting is the only feature: kept at module scope so the row models stay stable between renders.
const features = tableFeatures({ rowSortingFeature, sortedRowModel: createSortedRowModel(), sortFns: { basic: sortFn_basic, alphanumeric: sortFn_alphanumeric } });

/**
 * A sortable table (TanStack Table, sorting feature only). On a wide screen:
 * a table whose headings sort; on a phone: one card per row with a "sort by"
 * row of buttons. Pressing a row opens the walks behind it.
 */
export function DataTable<R extends object>({ columns, rows, rowKey, wide, initialSort = [], onRowPress, rowActionLabel, limit = 10, testID }: Props<R>) {
  const [sorting, setSorting] = useState<SortingState>(initialSort);
  const defs = useMemo<ColumnDef<typeof features, R>[]>(
    () =>
      columns.map((c) => ({
        id: c.id,
        header: c.header,
        accessorFn: (row: R) => c.value(row),
        sortFn: c.numeric ? 'basic' : 'alphanumeric',
        sortDescFirst: !!c.numeric,
      })),
    [columns],
  );
  const data = useMemo(() => [...rows], [rows]);
  const table = useTable({ features, columns: defs, data, getRowId: (row: R) => rowKey(row), state: { sorting }, onSortingChange: setSorting });
  const sorted = table.getSortedRowModel().rows;
  const [all, setAll] = useState(false);
  // Long tables show their first rows (in the chosen order) until asked for the rest; the CSV always has everything.
  const shown = all ? sorted : sorted.slice(0, limit);
  const more =
    sorted.length > limit ? (
      <Pressable accessibilityRole="button" onPress={() => setAll(!all)} style={styles.moreRows} testID={`${testID}-all`}>
        <Text style={styles.more}>{all ? `Show the first ${limit} only` : `Show all ${sorted.length} rows`}</Text>
      </Pressable>
    ) : null;
  const sortOf = (id: string) => sorting.find((s) => s.id === id);
  const toggle = (id: string) => table.getColumn(id)?.toggleSorting();
  const arrow = (id: string) => (sortOf(id) ? (sortOf(id)!.desc ? ' ▼' : ' ▲') : '');
  const ariaSort = (id: string) => (sortOf(id) ? (sortOf(id)!.desc ? 'descending' : 'ascending') : 'none');

  if (wide) {
    return (
      <View style={styles.block} testID={testID}>
        <View role="table" style={styles.table}>
          <View role="row" style={[styles.tr, styles.thead]}>
            {columns.map((c) => (
              <Pressable
                key={c.id}
                role="columnheader"
                aria-sort={ariaSort(c.id)}
                accessibilityLabel={`Sort by ${c.header}`}
                onPress={() => toggle(c.id)}
                style={[styles.th, c.primary ? styles.primaryCell : styles.cell, c.numeric && styles.numeric]}
                testID={`${testID}-sort-${c.id}`}
              >
                <Text style={[styles.thText, c.numeric && styles.right]}>
                  {c.header}
                  {arrow(c.id)}
                </Text>
              </Pressable>
            ))}
          </View>
          {shown.map((row) => (
            <Pressable
              key={row.id}
              role="row"
              onPress={onRowPress ? () => onRowPress(row.original) : undefined}
              accessibilityLabel={onRowPress && rowActionLabel ? rowActionLabel(row.original) : undefined}
              style={(state) => [styles.tr, (state as { hovered?: boolean }).hovered && onRowPress ? styles.hover : null]}
              testID={`${testID}-row-${row.id}`}
            >
              {columns.map((c) => (
                <View key={c.id} role="cell" style={[c.primary ? styles.primaryCell : styles.cell, c.numeric && styles.numeric]}>
                  {cellContent(c, row.original)}
                </View>
              ))}
            </Pressable>
          ))}
        </View>
        {more}
      </View>
    );
  }

  return (
    <View style={styles.list} testID={testID}>
      <ScrollView horizontal showsHorizontalScrollIndicator={false} contentContainerStyle={styles.sortRow} accessibilityLabel="Sort by">
        <Text style={styles.sortLabel}>Sort by</Text>
        {columns.map((c) => (
          <Pressable
            key={c.id}
            accessibilityRole="button"
            aria-sort={ariaSort(c.id)}
            accessibilityLabel={`Sort by ${c.header}`}
            onPress={() => toggle(c.id)}
            style={[styles.sortChip, sortOf(c.id) && styles.sortChipOn]}
            testID={`${testID}-sort-${c.id}`}
          >
            <Text style={[styles.sortChipText, sortOf(c.id) && styles.sortChipTextOn]}>
              {c.header}
              {arrow(c.id)}
            </Text>
          </Pressable>
        ))}
      </ScrollView>
      {shown.map((row) => {
        const primary = columns.find((c) => c.primary) ?? columns[0];
        return (
          <Pressable
            key={row.id}
            accessibilityRole={onRowPress ? 'button' : undefined}
            accessibilityLabel={onRowPress && rowActionLabel ? rowActionLabel(row.original) : undefined}
            onPress={onRowPress ? () => onRowPress(row.original) : undefined}
            style={styles.card}
            testID={`${testID}-row-${row.id}`}
          >
            <View>{cellContent(primary, row.original, true)}</View>
            <View style={styles.pairs}>
              {columns
                .filter((c) => c !== primary)
                .map((c) => (
                  <View key={c.id} style={styles.pair}>
                    <Text style={styles.pairLabel}>{c.header}</Text>
                    {cellContent(c, row.original)}
                  </View>
                ))}
            </View>
            {onRowPress ? <Text style={styles.more}>Show the walks ›</Text> : null}
          </Pressable>
        );
      })}
      {more}
    </View>
  );
}

function cellContent<R extends object>(c: TableColumn<R>, row: R, title = false) {
  if (c.render) return c.render(row);
  return <Text style={title ? styles.cardTitle : styles.td}>{String(c.value(row))}</Text>;
}

const styles = StyleSheet.create({
  block: { gap: space.sm },
  moreRows: { minHeight: touchTarget, justifyContent: 'center', alignSelf: 'flex-start', paddingHorizontal: space.sm },
  table: { width: '100%', borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, backgroundColor: colors.surface, overflow: 'hidden' },
  tr: { flexDirection: 'row', alignItems: 'center', minHeight: touchTarget, borderBottomWidth: 1, borderBottomColor: colors.line, paddingHorizontal: space.sm },
  thead: { backgroundColor: colors.paper },
  hover: { backgroundColor: colors.accentSoft },
  th: { minHeight: touchTarget, justifyContent: 'center' },
  thText: { ...type.label, color: colors.ink },
  cell: { flex: 1, minWidth: 0, paddingHorizontal: space.sm, paddingVertical: space.xs },
  primaryCell: { flex: 2.2, minWidth: 0, paddingHorizontal: space.sm, paddingVertical: space.xs },
  numeric: { alignItems: 'flex-end' },
  right: { textAlign: 'right' },
  td: { ...type.small, color: colors.ink, fontSize: 15 },
  list: { gap: space.sm },
  sortRow: { gap: space.sm, alignItems: 'center', paddingVertical: space.xs },
  sortLabel: { ...type.label, color: colors.inkMuted },
  sortChip: { minHeight: touchTarget, justifyContent: 'center', paddingHorizontal: space.md, borderRadius: radius.lg, borderWidth: 2, borderColor: colors.line, backgroundColor: colors.surface },
  sortChipOn: { borderColor: colors.accent, backgroundColor: colors.accentSoft },
  sortChipText: { fontFamily: fonts.semibold, fontSize: 15, color: colors.ink },
  sortChipTextOn: { color: colors.accentDark },
  card: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, padding: space.md, gap: space.sm },
  cardTitle: { ...type.subheading, color: colors.ink },
  pairs: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  pair: { minWidth: 120, gap: 2 },
  pairLabel: { ...type.small, color: colors.inkMuted },
  more: { fontFamily: fonts.bold, fontSize: 15, color: colors.accentDark },
});
