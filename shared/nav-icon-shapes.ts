/**
 * The navigation icons as data (24x24 line drawings): drawn by the app with
 * react-native-svg (components/nav/nav-icon.tsx) and by the server as plain
 * SVG in a page's first paint (server/http/walk-first-paint.ts), so both
 * draw the same picture.
 */
export type IconShape =
  | { kind: 'rect'; x: number; y: number; width: number; height: number; rx?: number }
  | { kind: 'path'; d: string }
  | { kind: 'line'; x1: number; y1: number; x2: number; y2: number }
  /** `filled`: a solid dot in the icon's colour rather than an outline. */
  | { kind: 'circle'; cx: number; cy: number; r: number; filled?: boolean };

const SETTINGS: IconShape[] = [
  { kind: 'line', x1: 4, y1: 6, x2: 20, y2: 6 },
  { kind: 'line', x1: 4, y1: 12, x2: 20, y2: 12 },
  { kind: 'line', x1: 4, y1: 18, x2: 20, y2: 18 },
  { kind: 'circle', cx: 9, cy: 6, r: 2.2, filled: true },
  { kind: 'circle', cx: 15, cy: 12, r: 2.2, filled: true },
  { kind: 'circle', cx: 7, cy: 18, r: 2.2, filled: true },
];

export const NAV_ICON_SHAPES: Record<string, IconShape[]> = {
  jobs: [
    { kind: 'rect', x: 5, y: 4, width: 14, height: 17, rx: 2 },
    { kind: 'path', d: 'M9 4V3h6v1' },
    { kind: 'line', x1: 8.5, y1: 10, x2: 15.5, y2: 10 },
    { kind: 'line', x1: 8.5, y1: 14, x2: 15.5, y2: 14 },
    { kind: 'line', x1: 8.5, y1: 18, x2: 12.5, y2: 18 },
  ],
  trees: [
    { kind: 'circle', cx: 12, cy: 4.5, r: 2 },
    { kind: 'circle', cx: 6, cy: 12, r: 2 },
    { kind: 'circle', cx: 18, cy: 12, r: 2 },
    { kind: 'circle', cx: 6, cy: 19.5, r: 2 },
    { kind: 'path', d: 'M11 6.2 7 10.3M13 6.2l4 4.1M6 14v3.5' },
  ],
  support: [
    { kind: 'rect', x: 3, y: 5, width: 18, height: 14, rx: 2 },
    { kind: 'path', d: 'm3.5 6 8.5 7 8.5-7' },
  ],
  patterns: [
    { kind: 'line', x1: 4, y1: 20, x2: 20, y2: 20 },
    { kind: 'rect', x: 5.5, y: 12, width: 3, height: 8 },
    { kind: 'rect', x: 10.5, y: 7, width: 3, height: 13 },
    { kind: 'rect', x: 15.5, y: 10, width: 3, height: 10 },
    { kind: 'path', d: 'M5 8.5 11 4l4.5 3L20 4' },
  ],
  readings: [
    { kind: 'path', d: 'M3.5 17a8.5 8.5 0 1 1 17 0' },
    { kind: 'line', x1: 12, y1: 17, x2: 16, y2: 10.5 },
    { kind: 'circle', cx: 12, cy: 17, r: 1.4 },
    { kind: 'line', x1: 5, y1: 20.5, x2: 19, y2: 20.5 },
  ],
  settings: SETTINGS,
};

/** An icon's shapes; an unknown name draws the settings sliders (as before). */
export const navIconShapes = (name: string): IconShape[] => NAV_ICON_SHAPES[name] ?? SETTINGS;
