import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { DrillMeasure, ExportTable, PatternDrillAnswer, PatternOptions, PatternReport } from '@/shared/schemas/patterns';
import type { InstallType } from '@/trees/tree-format';
import { api } from './api-client';

/** The filters the Patterns screen sends; empty fields are left out of the request. */
export interface PatternFilterInput {
  from?: string;
  to?: string;
  installType?: InstallType;
  treeId?: number;
  make?: string;
  engine?: string;
  techId?: number;
}

/** What a drill-down opens: one number of the report. */
export interface PatternDrillInput {
  measure: DrillMeasure;
  code?: string;
  outcome?: 'referred' | 'not_fixed';
  week?: string;
  /** Filters the row itself fixes (a repeat row's install type, a tree row's tree), over the screen's filters. */
  overrides?: Partial<PatternFilterInput>;
  /** Words for the heading of the list. */
  label: string;
}

/** Query keys for Patterns. */
export const patternKeys = {
  all: ['patterns'] as const,
  reports: () => [...patternKeys.all, 'report'] as const,
  report: (f: PatternFilterInput) => [...patternKeys.reports(), f] as const,
  options: () => [...patternKeys.all, 'options'] as const,
  drills: () => [...patternKeys.all, 'drill'] as const,
  drill: (f: PatternFilterInput, d: Omit<PatternDrillInput, 'label'>) => [...patternKeys.drills(), f, d] as const,
};

/** The query string for filters (and extra parameters), leaving out empty parts. */
export function patternQueryString(f: PatternFilterInput, extra: Record<string, string | undefined> = {}): string {
  const params = new URLSearchParams();
  for (const [k, v] of Object.entries({ ...f, ...extra })) {
    if (v !== undefined && v !== null && String(v).trim() !== '') params.set(k, String(v).trim());
  }
  const qs = params.toString();
  return qs ? `?${qs}` : '';
}

/** Where the browser downloads a table as CSV (a plain GET with the session cookie). */
export const patternExportUrl = (table: ExportTable, f: PatternFilterInput) => `/api/patterns/export/${table}.csv${patternQueryString(f)}`;

/** GET /api/patterns: every measure for the filters. */
export const patternReportOptions = (f: PatternFilterInput) =>
  queryOptions({
    queryKey: patternKeys.report(f),
    queryFn: () => api<PatternReport>(`/patterns${patternQueryString(f)}`),
    // Keep the last figures on screen while new filters load, so charts do not flash empty.
    placeholderData: keepPreviousData,
  });

/** GET /api/patterns/options: trees, makes, engines and people for the pickers. */
export const patternPickerOptions = () =>
  queryOptions({
    queryKey: patternKeys.options(),
    queryFn: () => api<PatternOptions>('/patterns/options'),
    staleTime: 5 * 60_000,
  });

/** GET /api/patterns/walks: the walks behind one number. */
export const patternDrillOptions = (f: PatternFilterInput, d: PatternDrillInput | null) =>
  queryOptions({
    queryKey: patternKeys.drill(f, d ? { measure: d.measure, code: d.code, outcome: d.outcome, week: d.week, overrides: d.overrides } : { measure: 'finished' }),
    queryFn: () => api<PatternDrillAnswer>(`/patterns/walks${patternQueryString({ ...f, ...d!.overrides }, { measure: d!.measure, code: d!.code, outcome: d!.outcome, week: d!.week })}`),
    enabled: d !== null,
  });

export const usePatternReport = (f: PatternFilterInput) => useQuery(patternReportOptions(f));
export const usePatternPickers = () => useQuery(patternPickerOptions());
export const usePatternDrill = (f: PatternFilterInput, d: PatternDrillInput | null) => useQuery(patternDrillOptions(f, d));
