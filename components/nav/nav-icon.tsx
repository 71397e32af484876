import Svg, { Circle, Line, Path, Rect } from 'react-native-svg';
import { navIconShapes } from '@/shared/nav-icon-shapes';

/** Line icons for the navigation entries, drawn in the current text colour (shapes in shared/nav-icon-shapes.ts). */
export function NavIcon({ name, color, size = 24 }: { name: string; color: string; size?: number }) {
  const stroke = { stroke: color, strokeWidth: 2, strokeLinecap: 'round' as const, strokeLinejoin: 'round' as const, fill: 'none' };
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" accessibilityElementsHidden importantForAccessibility="no">
      {navIconShapes(name).map((s, i) => {
        switch (s.kind) {
          case 'rect':
            return <Rect key={i} x={s.x} y={s.y} width={s.width} height={s.height} rx={s.rx} {...stroke} />;
          case 'path':
            return <Path key={i} d={s.d} {...stroke} />;
          case 'line':
            return <Line key={i} x1={s.x1} y1={s.y1} x2={s.x2} y2={s.y2} {...stroke} />;
          case 'circle':
            return s.filled ? <Circle key={i} cx={s.cx} cy={s.cy} r={s.r} fill={color} stroke={color} /> : <Circle key={i} cx={s.cx} cy={s.cy} r={s.r} {...stroke} />;
        }
      })}
    </Svg>
  );
}
