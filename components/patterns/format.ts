/** Display helpers for the Patterns screen (pure, tested without rendering). */

const DAY_MS = 86_400_000;

/** A share (0–1) as a whole percentage, with one decimal under 10 %. */
export function percent(share: number): string {
  const p = share * 100;
  if (p > 0 && p < 10) return `${p.toFixed(1)} %`;
  return `${Math.round(p)} %`;
}

/** Seconds as minutes for people: "45 min", "1 h 05 min". */
export function duration(seconds: number): string {
  const m = Math.round(seconds / 60);
  if (m < 60) return `${m} min`;
  return `${Math.floor(m / 60)} h ${String(m % 60).padStart(2, '0')} min`;
}

/** Steps with at most one decimal ("6", "8.4"). */
export const steps = (n: number) => (Number.isInteger(n) ? String(n) : n.toFixed(1));

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/** "2 Mar 2026" from an ISO date or instant (UTC, as the API counts days). */
export function day(iso: string, withYear = true): string {
  const d = new Date(iso.length === 10 ? `${iso}T00:00:00Z` : iso);
  return `${d.getUTCDate()} ${MONTHS[d.getUTCMonth()]}${withYear ? ` ${d.getUTCFullYear()}` : ''}`;
}

/** YYYY-MM-DD of an instant in UTC. */
export const isoDay = (d: Date) => d.toISOString().slice(0, 10);

/** Range presets offered as chips: the last N weeks up to today. */
export const RANGE_PRESETS = [
  { key: '4w', label: '4 weeks', days: 28 },
  { key: '13w', label: '13 weeks', days: 91 },
  { key: '26w', label: '26 weeks', days: 182 },
  { key: '52w', label: '52 weeks', days: 364 },
] as const;
export type RangePreset = (typeof RANGE_PRESETS)[number]['key'];

/** The from/to days of a preset ending today. */
export function presetRange(key: RangePreset, today = new Date()): { from: string; to: string } {
  const days = RANGE_PRESETS.find((p) => p.key === key)!.days;
  const to = isoDay(today);
  return { from: isoDay(new Date(Date.parse(`${to}T00:00:00Z`) - (days - 1) * DAY_MS)), to };
}

/** True for a real calendar day written YYYY-MM-DD. */
export function isIsoDay(s: string): boolean {
  return /^\d{4}-\d{2}-\d{2}$/.test(s) && !Number.isNaN(Date.parse(`${s}T00:00:00Z`)) && new Date(`${s}T00:00:00Z`).toISOString().startsWith(s);
}
