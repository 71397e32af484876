import Svg, { Circle, Path } from 'react-native-svg';
import type { StepKind } from '@/trees/tree-format';

/** Baywalk's own line icon for each step kind, always shown beside its word. */
export function KindIcon({ kind, color, size = 18 }: { kind: StepKind; color: string; size?: number }) {
  const stroke = { stroke: color, strokeWidth: 2.2, strokeLinecap: 'round' as const, strokeLinejoin: 'round' as const, fill: 'none' };
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" accessibilityElementsHidden importantForAccessibility="no">
      {kind === 'ask' ? (
        <>
          <Circle cx={12} cy={12} r={9} {...stroke} />
          <Path d="M9.6 9.3a2.5 2.5 0 1 1 3.4 2.3c-.7.3-1 .8-1 1.5v.6" {...stroke} />
          <Circle cx={12} cy={16.8} r={1.1} fill={color} />
        </>
      ) : kind === 'reading' ? (
        <>
          <Path d="M3.5 16.5a8.5 8.5 0 1 1 17 0" {...stroke} />
          <Path d="M12 16.5l4.2-6" {...stroke} />
          <Circle cx={12} cy={16.5} r={1.5} fill={color} />
        </>
      ) : kind === 'action' ? (
        <Path d="M15 4.2a4.5 4.5 0 0 0-5.6 5.7L4 15.3 8.7 20l5.4-5.4a4.5 4.5 0 0 0 5.7-5.6l-2.9 2.9-2.9-.8-.8-2.9z" {...stroke} />
      ) : kind === 'cause' ? (
        <>
          <Circle cx={12} cy={12} r={8.5} {...stroke} />
          <Circle cx={12} cy={12} r={4.5} {...stroke} />
          <Circle cx={12} cy={12} r={1.4} fill={color} />
        </>
      ) : (
        <>
          <Path d="M10.5 5.5H6a1.5 1.5 0 0 0-1.5 1.5v11A1.5 1.5 0 0 0 6 19.5h11a1.5 1.5 0 0 0 1.5-1.5v-4.5" {...stroke} />
          <Path d="M14 4.5h5.5V10M19.5 4.5l-8.5 8.5" {...stroke} />
        </>
      )}
    </Svg>
  );
}
