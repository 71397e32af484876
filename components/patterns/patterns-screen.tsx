import { useState } from 'react';
import { ActivityIndicator, StyleSheet, Text, View, useWindowDimensions } from 'react-native';
import type { PatternReport } from '@/shared/schemas/patterns';
import { INSTALL_TYPE_LABELS } from '@/trees/tree-format';
import { patternExportUrl, usePatternPickers, usePatternReport, type PatternDrillInput, type PatternFilterInput } from '@/hooks/use-patterns';
import { ApiError } from '@/hooks/api-client';
import { Screen } from '@/components/screen';
import { ThemedText } from '@/components/themed-text';
import { Notice } from '@/components/notice';
import { Button } from '@/components/button';
import { BarChart } from '@/components/charts/bar-chart';
import { LineChart } from '@/components/charts/line-chart';
import { colors, radius, space, wideBreakpoint } from '@/components/theme';
import { PatternFilters } from './pattern-filters';
import { SummaryFigures } from './summary-figures';
import { DataTable } from './data-table';
import { DrillSheet } from './drill-sheet';
import { causeColumns, comebackColumns, repeatColumns, TableSection, timeColumns, unresolvedColumns, weekColumns } from './pattern-tables';
import { day, percent, presetRange } from './format';
import { LoadError } from '@/components/load-error';

/** The Patterns screen: filters, figures, charts and sortable tables of the shop's finished walks, with drill-down to the walks. */
export function PatternsScreen() {
  const { width } = useWindowDimensions();
  const wide = width >= wideBreakpoint;
  const [filters, setFilters] = useState<PatternFilterInput>(() => presetRange('26w'));
  const [drill, setDrill] = useState<PatternDrillInput | null>(null);
  const report = usePatternReport(filters);
  const pickers = usePatternPickers();

  return (
    <Screen testID="patterns-screen">
      <ThemedText variant="title" accessibilityRole="header">
        Patterns
      </ThemedText>
      <ThemedText muted>
        Which causes keep following an install, and which cars come back. Counted from finished walks on jobs, by the day they finished (UTC); guest walks are left out.
      </ThemedText>
      <PatternFilters value={filters} onChange={setFilters} pickers={pickers.data} wide={wide} />
      {report.isPending ? (
        <View style={styles.row} testID="patterns-loading">
          <ActivityIndicator color={colors.accent} />
          <ThemedText muted>Counting the shop's walks…</ThemedText>
        </View>
      ) : report.isError ? (
        <LoadError
          title={report.error instanceof ApiError && report.error.status === 403 ? 'Patterns are for owners and leads' : 'Could not load the figures'}
          error={report.error}
          onRetry={report.refetch}
          busy={report.isFetching}
          testID="patterns-error"
        />
      ) : (
        <Body report={report.data} wide={wide} updating={report.isPlaceholderData} onDrill={setDrill} onClear={() => setFilters(presetRange('26w'))} />
      )}
      <DrillSheet filters={filters} drill={drill} onClose={() => setDrill(null)} />
    </Screen>
  );
}

interface BodyProps {
  report: PatternReport;
  wide: boolean;
  updating: boolean;
  onDrill: (d: PatternDrillInput) => void;
  onClear: () => void;
}

function Body({ report, wide, updating, onDrill, onClear }: BodyProps) {
  const range = `${day(report.filters.from)} to ${day(report.filters.to)}`;
  if (report.totals.finished === 0) {
    return (
      <View style={styles.col} testID="patterns-empty">
        <Notice tone="info" title="No finished walks here">
          {`No walk on a job finished between ${range} with these filters. Try a longer period or clear the filters.`}
        </Notice>
        <Button label="Last 26 weeks, no filters" kind="secondary" onPress={onClear} testID="patterns-reset" />
      </View>
    );
  }
  // The filters the server applied (dates made explicit), so the file holds exactly what the screen shows.
  const f = report.filters;
  const applied: PatternFilterInput = { from: f.from, to: f.to, installType: f.installType ?? undefined, treeId: f.treeId ?? undefined, make: f.make ?? undefined, engine: f.engine ?? undefined, techId: f.techId ?? undefined };
  const exportHref = (t: Parameters<typeof patternExportUrl>[0]) => patternExportUrl(t, applied);
  const half = wide ? styles.half : null;
  return (
    <View style={[styles.col, updating && styles.updating]} testID="patterns-results" aria-busy={updating}>
      {updating ? <ThemedText muted>Updating…</ThemedText> : null}
      <SummaryFigures totals={report.totals} windowDays={report.windowDays} range={range} onDrill={onDrill} />
      <View style={[styles.col, wide && styles.pair]}>
        <View style={[styles.card, half]} testID="causes-chart-card">
          <ThemedText variant="heading" accessibilityRole="header">
            Causes found
          </ThemedText>
          <BarChart
            title="Causes found, most frequent first"
            testID="causes-chart"
            data={report.causes.slice(0, 10).map((c) => ({ key: c.code, label: c.title, value: c.walks, note: percent(c.share) }))}
            onPress={(d) => onDrill({ measure: 'cause', code: d.key, label: `Walks that found “${d.label}”` })}
          />
        </View>
        <View style={[styles.card, half]} testID="trend-chart-card">
          <ThemedText variant="heading" accessibilityRole="header">
            Week by week
          </ThemedText>
          <LineChart
            title="Finished walks per week"
            testID="trend-chart"
            xLabels={report.weeks.map((w) => day(w.week, false))}
            series={[
              { key: 'finished', label: 'Finished walks', values: report.weeks.map((w) => w.finished), color: colors.ink, marker: 'circle' },
              { key: 'cause', label: 'Cause found', values: report.weeks.map((w) => w.withCause), color: colors.accent, marker: 'square', dash: '6 4' },
              { key: 'unresolved', label: 'Referred or not fixed', values: report.weeks.map((w) => w.referred + w.notFixed), color: colors.caution, marker: 'none', dash: '2 3' },
            ]}
          />
        </View>
      </View>
      <TableSection title="Repeat causes" about="The same cause on two or more jobs with the same install: fix the procedure or the parts, not only the car." exportHref={exportHref('repeats')} table="repeats" testID="section-repeats">
        {report.repeats.length ? (
          <DataTable
            columns={repeatColumns}
            rows={report.repeats}
            rowKey={(r) => `${r.installType}-${r.code}`}
            wide={wide}
            initialSort={[{ id: 'jobs', desc: true }]}
            onRowPress={(r) => onDrill({ measure: 'cause', code: r.code, overrides: { installType: r.installType }, label: `“${r.title}” after ${INSTALL_TYPE_LABELS[r.installType].toLowerCase()} installs` })}
            rowActionLabel={(r) => `Show the ${r.walks} walks that found ${r.title} after ${INSTALL_TYPE_LABELS[r.installType]}`}
            testID="table-repeats"
          />
        ) : (
          <Notice tone="info" title="No repeats">No cause was found on two different jobs with the same install in this period.</Notice>
        )}
      </TableSection>
      <TableSection title="Comebacks" about={`The same VIN walked again within ${report.windowDays} days of a walk closed as fixed, for the same symptom or reaching the same cause.`} exportHref={exportHref('comebacks')} table="comebacks" testID="section-comebacks">
        {report.comebacks.length ? (
          <DataTable columns={comebackColumns} rows={report.comebacks} rowKey={(r) => `${r.first.walkId}-${r.again.walkId}`} wide={wide} initialSort={[{ id: 'again', desc: true }]} testID="table-comebacks" />
        ) : (
          <Notice tone="ok" title="No comebacks">No car came back within the window after a walk closed as fixed.</Notice>
        )}
      </TableSection>
      <TableSection title="Causes found" about="Walks that ended at a cause, as a share of all finished walks." exportHref={exportHref('causes')} table="causes" testID="section-causes">
        <DataTable
          columns={causeColumns}
          rows={report.causes}
          rowKey={(r) => r.code}
          wide={wide}
          initialSort={[{ id: 'walks', desc: true }]}
          onRowPress={(r) => onDrill({ measure: 'cause', code: r.code, label: `Walks that found “${r.title}”` })}
          rowActionLabel={(r) => `Show the ${r.walks} walks that found ${r.title}`}
          testID="table-causes"
        />
      </TableSection>
      <TableSection title="Referred or not fixed" about="Finished walks per tree that were handed over or ended without a fix." exportHref={exportHref('unresolved')} table="unresolved" testID="section-unresolved">
        <DataTable
          columns={unresolvedColumns}
          rows={report.unresolved}
          rowKey={(r) => String(r.treeId)}
          wide={wide}
          initialSort={[{ id: 'share', desc: true }]}
          onRowPress={(r) => onDrill({ measure: 'unresolved', overrides: { treeId: r.treeId }, label: `Referred or not fixed: ${r.treeTitle}` })}
          rowActionLabel={(r) => `Show the ${r.referred + r.notFixed} walks referred or not fixed on ${r.treeTitle}`}
          testID="table-unresolved"
        />
      </TableSection>
      <TableSection title="Time and steps to a cause" about="Per tree, over walks that ended at a cause: the median and the 90th percentile (nine walks in ten were quicker)." exportHref={exportHref('times')} table="times" testID="section-times">
        <DataTable
          columns={timeColumns}
          rows={report.times}
          rowKey={(r) => String(r.treeId)}
          wide={wide}
          initialSort={[{ id: 'median', desc: true }]}
          onRowPress={(r) => onDrill({ measure: 'timed', overrides: { treeId: r.treeId }, label: `Walks to a cause: ${r.treeTitle}` })}
          rowActionLabel={(r) => `Show the ${r.walks} walks to a cause on ${r.treeTitle}`}
          testID="table-times"
        />
      </TableSection>
      <TableSection title="Weeks" about="Each week from Monday; fixed walks that came back are counted in the week they closed." exportHref={exportHref('weeks')} table="weeks" testID="section-weeks">
        <DataTable
          columns={weekColumns}
          rows={report.weeks}
          rowKey={(r) => r.week}
          wide={wide}
          initialSort={[{ id: 'week', desc: true }]}
          onRowPress={(r) => onDrill({ measure: 'week', week: r.week, label: `Walks finished in the week of ${day(r.week)}` })}
          rowActionLabel={(r) => `Show the ${r.finished} walks finished in the week of ${day(r.week)}`}
          testID="table-weeks"
        />
      </TableSection>
      <TableSection title="All finished walks" about="Every walk counted above, one line each, for a spreadsheet." exportHref={exportHref('walks')} table="walks" testID="section-walks">
        <Button label={`Show the ${report.totals.finished} walks`} kind="secondary" onPress={() => onDrill({ measure: 'finished', label: `Finished walks, ${range}` })} testID="show-all-walks" />
      </TableSection>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  col: { gap: space.xl },
  pair: { flexDirection: 'row', alignItems: 'flex-start' },
  half: { flex: 1, minWidth: 0 },
  card: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, padding: space.lg, gap: space.md },
  updating: { opacity: 0.7 },
});
