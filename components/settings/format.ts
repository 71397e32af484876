/** A date and time for people lists: "3 Dec 2026, 14:05" in the viewer's zone, or the fallback. */
export function shortDateTime(iso: string | null, fallback = 'Never'): string {
  if (!iso) return fallback;
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return fallback;
  return d.toLocaleString('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });
}

/** Metres ↔ feet, by the international foot (exactly 0.3048 m). */
export const FOOT_M = 0.3048;
export const metresToFeet = (m: number) => Math.round(m / FOOT_M);
export const feetToMetres = (ft: number) => Math.round(ft * FOOT_M);
