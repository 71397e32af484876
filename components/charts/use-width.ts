import { useCallback, useState } from 'react';
import type { LayoutChangeEvent } from 'react-native';

/** The laid-out width of a view, so a chart can draw to fit it (0 until the first layout). */
export function useWidth(): [number, (e: LayoutChangeEvent) => void] {
  const [width, setWidth] = useState(0);
  const onLayout = useCallback((e: LayoutChangeEvent) => {
    const w = Math.floor(e.nativeEvent.layout.width);
    setWidth((old) => (Math.abs(old - w) > 1 ? w : old));
  }, []);
  return [width, onLayout];
}
