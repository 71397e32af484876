import Svg, { Circle, Line, Path, Rect } from 'react-native-svg';

/** Line icons for the navigation entries, drawn in the current text colour. */
export function NavIcon({ name, color, size = 24 }: { name: string; color: string; size?: number }) {
  const stroke = { stroke: color, strokeWidth: 2, strokeLinecap: 'round' as const, strokeLinejoin: 'round' as const, fill: 'none' };
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" accessibilityElementsHidden importantForAccessibility="no">
      {name === 'jobs' ? (
        <>
          <Rect x={5} y={4} width={14} height={17} rx={2} {...stroke} />
          <Path d="M9 4V3h6v1" {...stroke} />
          <Line x1={8.5} y1={10} x2={15.5} y2={10} {...stroke} />
          <Line x1={8.5} y1={14} x2={15.5} y2={14} {...stroke} />
          <Line x1={8.5} y1={18} x2={12.5} y2={18} {...stroke} />
        </>
      ) : name === 'trees' ? (
        <>
          <Circle cx={12} cy={4.5} r={2} {...stroke} />
          <Circle cx={6} cy={12} r={2} {...stroke} />
          <Circle cx={18} cy={12} r={2} {...stroke} />
          <Circle cx={6} cy={19.5} r={2} {...stroke} />
          <Path d="M11 6.2 7 10.3M13 6.2l4 4.1M6 14v3.5" {...stroke} />
        </>
      ) : name === 'support' ? (
        <>
          <Rect x={3} y={5} width={18} height={14} rx={2} {...stroke} />
          <Path d="m3.5 6 8.5 7 8.5-7" {...stroke} />
        </>
      ) : name === 'patterns' ? (
        <>
          <Line x1={4} y1={20} x2={20} y2={20} {...stroke} />
          <Rect x={5.5} y={12} width={3} height={8} {...stroke} />
          <Rect x={10.5} y={7} width={3} height={13} {...stroke} />
          <Rect x={15.5} y={10} width={3} height={10} {...stroke} />
          <Path d="M5 8.5 11 4l4.5 3L20 4" {...stroke} />
        </>
      ) : name === 'readings' ? (
        <>
          <Path d="M3.5 17a8.5 8.5 0 1 1 17 0" {...stroke} />
          <Line x1={12} y1={17} x2={16} y2={10.5} {...stroke} />
          <Circle cx={12} cy={17} r={1.4} {...stroke} />
          <Line x1={5} y1={20.5} x2={19} y2={20.5} {...stroke} />
        </>
      ) : (
        <>
          <Line x1={4} y1={6} x2={20} y2={6} {...stroke} />
          <Line x1={4} y1={12} x2={20} y2={12} {...stroke} />
          <Line x1={4} y1={18} x2={20} y2={18} {...stroke} />
          <Circle cx={9} cy={6} r={2.2} fill={color} stroke={color} />
          <Circle cx={15} cy={12} r={2.2} fill={color} stroke={color} />
          <Circle cx={7} cy={18} r={2.2} fill={color} stroke={color} />
        </>
      )}
    </Svg>
  );
}
