import { useEffect, useMemo, useRef, useState } from 'react';
import { useShop } from '@/hooks/use-shop';
import { assessReadings, type ReadingsAssessment } from '@/shared/readings/readings-check';
import { initialFormState, toCheckInput, type ReadingsFormState } from './readings-form-state';

/** Fields the shop's settings fill in until the person changes them. */
const SHOP_DEFAULTED = ['altitudeText', 'altitudeUnit', 'baroUnit', 'vacuumUnit'] as const;

/**
 * The Readings form: state, the shop's defaults (altitude and pressure unit from
 * GET /api/shop, sea level and inHg until it answers or if it cannot), and the
 * live judgement computed in the browser by the same shared module as the server.
 */
export function useReadingsForm() {
  const shop = useShop();
  const [state, setState] = useState<ReadingsFormState>(() => initialFormState());
  const touched = useRef(new Set<keyof ReadingsFormState>());

  useEffect(() => {
    if (!shop.data) return;
    const defaults = initialFormState({ altitudeM: shop.data.altitudeM, pressureUnit: shop.data.pressureUnit });
    setState((s) => {
      const next = { ...s };
      for (const key of SHOP_DEFAULTED) if (!touched.current.has(key)) (next as Record<string, unknown>)[key] = defaults[key];
      return next;
    });
  }, [shop.data]);

  const update = (patch: Partial<ReadingsFormState>) => {
    for (const key of Object.keys(patch) as Array<keyof ReadingsFormState>) touched.current.add(key);
    setState((s) => ({ ...s, ...patch }));
  };

  const setTrim = (bank: 'bank1' | 'bank2', speed: 'idle' | 'at2500', part: 'shortText' | 'longText', text: string) =>
    setState((s) => ({ ...s, trims: { ...s.trims, [bank]: { ...s.trims[bank], [speed]: { ...s.trims[bank][speed], [part]: text } } } }));

  const translation = useMemo(() => toCheckInput(state), [state]);
  const assessment: ReadingsAssessment = useMemo(() => assessReadings(translation.input), [translation]);
  // Text that is not a number outranks what the check says about the rest.
  const errors = { ...assessment.errors, ...translation.errors };

  return {
    state,
    update,
    setTrim,
    input: translation.input,
    hasReading: translation.hasReading,
    result: assessment.result,
    errors,
    shopName: shop.data?.name,
    shopDefaultsLoaded: !!shop.data,
  };
}
