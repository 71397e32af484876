import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { STEP_KINDS, STEP_KIND_LABELS, type StepKind, type TreeDoc } from '@/trees/tree-format';
import { StepKindBadge } from '@/components/trees/step-kind-badge';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';

interface Props {
  doc: TreeDoc;
  /** The step the answer belongs to (left out of the choices). */
  fromId: string;
  value: string;
  label: string;
  onChange: (target: string) => void;
  /** Makes a new step of a kind and aims the answer at it. */
  onCreate: (kind: StepKind) => void;
  onOpen?: (id: string) => void;
  error?: string;
  testID: string;
}

/**
 * Where an answer leads: shows the chosen step (kind word, title, id) and,
 * when opened, every other step plus "new step" entries, as large rows.
 */
export function StepTargetPicker({ doc, fromId, value, label, onChange, onCreate, onOpen, error, testID }: Props) {
  const [open, setOpen] = useState(false);
  const states = doc.machine.states;
  const chosen = value ? states[value] : undefined;
  const choose = (fn: () => void) => {
    fn();
    setOpen(false);
  };
  return (
    <View style={styles.wrap}>
      <Text style={styles.label}>{label}</Text>
      <View style={styles.row}>
        <Pressable
          accessibilityRole="button"
          accessibilityLabel={`${label}: ${chosen ? chosen.meta.title || value : value ? `missing step ${value}` : 'not chosen'}. Change`}
          onPress={() => setOpen(!open)}
          style={[styles.current, !!error && styles.invalid]}
          testID={testID}
        >
          {chosen ? <StepKindBadge kind={chosen.meta.kind} /> : null}
          <Text style={styles.currentText} numberOfLines={2}>
            {chosen ? `${chosen.meta.title || 'Untitled step'} · ${value}` : value ? `✖ No step "${value}"` : 'Choose a step…'}
          </Text>
          <Text style={styles.chevron}>{open ? '▲' : '▼'}</Text>
        </Pressable>
        {chosen && onOpen ? (
          <Pressable accessibilityRole="button" onPress={() => onOpen(value)} style={styles.open} testID={`${testID}-open`}>
            <Text style={styles.openText}>Open ›</Text>
          </Pressable>
        ) : null}
      </View>
      {error ? <Text style={styles.error}>✖ {error}</Text> : null}
      {open ? (
        <View style={styles.menu} testID={`${testID}-menu`}>
          {Object.entries(states)
            .filter(([id]) => id !== fromId)
            .map(([id, s]) => (
              <Pressable
                key={id}
                accessibilityRole="button"
                onPress={() => choose(() => onChange(id))}
                style={({ pressed }) => [styles.option, id === value && styles.picked, pressed && styles.pressed]}
                testID={`${testID}-to-${id}`}
              >
                <StepKindBadge kind={s.meta.kind} />
                <Text style={styles.optionText} numberOfLines={2}>
                  {id === value ? '✓ ' : ''}
                  {s.meta.title || 'Untitled step'} · {id}
                </Text>
              </Pressable>
            ))}
          <Text style={styles.newHead}>Or a new step:</Text>
          <View style={styles.newRow}>
            {STEP_KINDS.map((k) => (
              <Pressable key={k} accessibilityRole="button" onPress={() => choose(() => onCreate(k))} style={styles.newBtn} testID={`${testID}-new-${k}`}>
                <Text style={styles.newText}>+ New {STEP_KIND_LABELS[k].toLowerCase()} step</Text>
              </Pressable>
            ))}
          </View>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  label: { ...type.label, color: colors.ink },
  row: { flexDirection: 'row', gap: space.sm, alignItems: 'stretch' },
  current: {
    flex: 1,
    minHeight: touchTarget,
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.sm,
    paddingHorizontal: space.md,
    borderWidth: 2,
    borderColor: colors.line,
    borderRadius: radius.md,
    backgroundColor: colors.surface,
  },
  invalid: { borderColor: colors.danger },
  currentText: { ...type.small, flex: 1, color: colors.ink },
  chevron: { color: colors.inkMuted, fontSize: 12 },
  open: { minHeight: touchTarget, minWidth: touchTarget, paddingHorizontal: space.md, justifyContent: 'center', borderRadius: radius.md, borderWidth: 2, borderColor: colors.accent },
  openText: { fontFamily: fonts.semibold, color: colors.accentDark, fontSize: 15 },
  error: { ...type.small, fontFamily: fonts.semibold, color: colors.danger },
  menu: { borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, backgroundColor: colors.surface, padding: space.sm, gap: space.xs },
  option: { minHeight: touchTarget, flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingHorizontal: space.sm, borderRadius: radius.sm },
  picked: { backgroundColor: colors.accentSoft },
  pressed: { opacity: 0.8 },
  optionText: { ...type.small, flex: 1, color: colors.ink },
  newHead: { ...type.label, color: colors.inkMuted, marginTop: space.sm },
  newRow: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  newBtn: { minHeight: touchTarget, justifyContent: 'center', paddingHorizontal: space.md, borderRadius: radius.md, borderWidth: 2, borderColor: colors.accent, borderStyle: 'dashed' },
  newText: { fontFamily: fonts.semibold, color: colors.accentDark, fontSize: 15 },
});
