import { useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { INSTALL_TYPES, INSTALL_TYPE_LABELS, type InstallType } from '@/trees/tree-format';
import type { PatternOptions } from '@/shared/schemas/patterns';
import type { PatternFilterInput } from '@/hooks/use-patterns';
import { TextField } from '@/components/forms/text-field';
import { Button } from '@/components/button';
import { space } from '@/components/theme';
import { ChoiceChips, type Chip } from './choice-chips';
import { isIsoDay, presetRange, RANGE_PRESETS, type RangePreset } from './format';

interface Props {
  value: PatternFilterInput;
  onChange: (f: PatternFilterInput) => void;
  pickers: PatternOptions | undefined;
  wide: boolean;
}

const any = <T,>(label: string): Chip<T | undefined> => ({ key: 'any', label, value: undefined });

/** How many filters beyond the date range are on (shown on the "More filters" button). */
export const activeFilterCount = (f: PatternFilterInput) => [f.installType, f.treeId, f.make, f.engine, f.techId].filter((v) => v !== undefined).length;

/**
 * The filters at the top of Patterns: a date range (presets or typed days),
 * then install type, tree, make, engine and technician. The
 * second group folds away behind "More filters" (its button says how many are on).
 */
export function PatternFilters({ value, onChange, pickers, wide }: Props) {
  const [open, setOpen] = useState(false);
  const [from, setFrom] = useState(value.from ?? '');
  const [to, setTo] = useState(value.to ?? '');
  useEffect(() => {
    setFrom(value.from ?? '');
    setTo(value.to ?? '');
  }, [value.from, value.to]);
  const preset = RANGE_PRESETS.find((p) => {
    const r = presetRange(p.key);
    return r.from === value.from && r.to === value.to;
  })?.key;
  const fromError = from && !isIsoDay(from) ? 'Write the day as YYYY-MM-DD.' : undefined;
  const toError = to && !isIsoDay(to) ? 'Write the day as YYYY-MM-DD.' : from && to && isIsoDay(from) && isIsoDay(to) && to < from ? 'The end is before the start.' : undefined;
  const applyDays = () => {
    if (from && to && !fromError && !toError && (from !== value.from || to !== value.to)) onChange({ ...value, from, to });
  };
  const set = (patch: Partial<PatternFilterInput>) => onChange({ ...value, ...patch });
  const count = activeFilterCount(value);
  const showMore = open;

  return (
    <View style={styles.wrap} testID="pattern-filters">
      <ChoiceChips<RangePreset | undefined>
        label="Period"
        testID="range"
        value={preset}
        onChange={(k) => k && onChange({ ...value, ...presetRange(k) })}
        chips={RANGE_PRESETS.map((p) => ({ key: p.key, label: `Last ${p.label}`, value: p.key }))}
      />
      <View style={[styles.days, wide && styles.daysWide]}>
        <View style={[styles.day, wide && styles.dayWide]}>
          <TextField label="From" value={from} onChangeText={setFrom} onBlur={applyDays} onSubmitEditing={applyDays} placeholder="YYYY-MM-DD" error={fromError} autoCapitalize="none" testID="filter-from" />
        </View>
        <View style={[styles.day, wide && styles.dayWide]}>
          <TextField label="To" value={to} onChangeText={setTo} onBlur={applyDays} onSubmitEditing={applyDays} placeholder="YYYY-MM-DD" error={toError} autoCapitalize="none" testID="filter-to" />
        </View>
        <View style={wide ? styles.moreButtonWide : styles.moreButtonPhone}>
          <Button label={open ? 'Fewer filters' : count ? `More filters (${count} on)` : 'More filters'} kind="secondary" onPress={() => setOpen(!open)} testID="more-filters" />
        </View>
      </View>
      {showMore ? (
        <View style={styles.more} testID="more-filter-panel">
          <ChoiceChips<InstallType | undefined>
            label="Install"
            testID="filter-install"
            value={value.installType}
            onChange={(installType) => set({ installType })}
            chips={[any<InstallType>('Any install'), ...INSTALL_TYPES.map((t) => ({ key: t, label: INSTALL_TYPE_LABELS[t], value: t as InstallType | undefined }))]}
          />
          <ChoiceChips<number | undefined>
            label="Tree"
            testID="filter-tree"
            value={value.treeId}
            onChange={(treeId) => set({ treeId })}
            chips={[any<number>('Any tree'), ...(pickers?.trees ?? []).map((t) => ({ key: String(t.id), label: t.title, value: t.id as number | undefined }))]}
          />
          <ChoiceChips<string | undefined>
            label="Make"
            testID="filter-make"
            value={value.make}
            onChange={(make) => set({ make })}
            chips={[any<string>('Any make'), ...(pickers?.makes ?? []).map((m) => ({ key: m, label: m, value: m as string | undefined }))]}
          />
          <ChoiceChips<string | undefined>
            label="Engine"
            testID="filter-engine"
            value={value.engine}
            onChange={(engine) => set({ engine })}
            chips={[any<string>('Any engine'), ...(pickers?.engines ?? []).map((m) => ({ key: m, label: m, value: m as string | undefined }))]}
          />
          <ChoiceChips<number | undefined>
            label="Technician"
            testID="filter-tech"
            value={value.techId}
            onChange={(techId) => set({ techId })}
            chips={[any<number>('Anyone'), ...(pickers?.techs ?? []).map((t) => ({ key: String(t.id), label: t.name, value: t.id as number | undefined }))]}
          />
          {count ? <Button label="Clear these filters" kind="secondary" onPress={() => onChange({ from: value.from, to: value.to })} testID="clear-filters" /> : null}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  days: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  daysWide: { alignItems: 'flex-end' },
  day: { flexGrow: 1, flexBasis: 140 },
  dayWide: { flexGrow: 0, flexBasis: 190 },
  moreButtonWide: { marginLeft: 'auto' },
  moreButtonPhone: { flexBasis: '100%' },
  more: { gap: space.md },
});
