import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { INSTALL_TYPES, INSTALL_TYPE_LABELS, SYMPTOMS, SYMPTOM_LABELS, type InstallType, type StepKind, type TreeDoc } from '@/trees/tree-format';
import { TextField } from '@/components/forms/text-field';
import { SegmentedChoice } from '@/components/forms/segmented-choice';
import { CheckboxRow } from '@/components/jobs/checkbox-row';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';
import type { Doc } from './editor-model';
import { treeFieldErrors } from './field-errors';
import { StepTargetPicker } from './step-target-picker';

/** The tree's own facts (what the library shows) and its first step; folded away until opened. */
export function TreeDetailsForm({ doc, update, createStep }: { doc: TreeDoc; update: (fn: (d: Doc) => Doc) => void; createStep: (kind: StepKind) => string }) {
  const errors = treeFieldErrors(doc);
  const [open, setOpen] = useState(Object.keys(errors).length > 0);
  const set = (patch: Partial<TreeDoc>) => update((d) => ({ ...d, ...patch }));
  const toggleInstall = (t: InstallType, on: boolean) => set({ installTypes: on ? [...doc.installTypes, t] : doc.installTypes.filter((x) => x !== t) });
  return (
    <View style={styles.box} testID="tree-details">
      <Pressable accessibilityRole="button" accessibilityState={{ expanded: open }} onPress={() => setOpen(!open)} style={styles.head} testID="tree-details-toggle">
        <Text style={styles.headText}>
          {open ? '▼' : '▶'} Tree details: title, symptom, install types, first step{Object.keys(errors).length ? '  ✖ needs attention' : ''}
        </Text>
      </Pressable>
      {open ? (
        <View style={styles.body}>
          <TextField label="Tree title" value={doc.title} onChangeText={(title) => set({ title })} error={errors.title} testID="tree-title" />
          <SegmentedChoice label="Symptom" options={SYMPTOMS.map((s) => ({ value: s, label: SYMPTOM_LABELS[s] }))} value={doc.symptom} onChange={(symptom) => set({ symptom })} error={errors.symptom} testID="tree-symptom" />
          <Text style={styles.label}>After which installs</Text>
          <View style={styles.checks}>
            {INSTALL_TYPES.map((t) => (
              <CheckboxRow key={t} label={INSTALL_TYPE_LABELS[t]} checked={doc.installTypes.includes(t)} onChange={(on) => toggleInstall(t, on)} testID={`tree-install-${t}`} />
            ))}
          </View>
          {errors.installTypes ? <Text style={styles.error}>✖ {errors.installTypes}</Text> : null}
          <TextField label="Summary" value={doc.summary ?? ''} multiline onChangeText={(summary) => set({ summary })} error={errors.summary} testID="tree-summary" />
          <StepTargetPicker
            doc={doc}
            fromId=""
            value={doc.machine.initial}
            label="First step of every walk"
            onChange={(initial) => update((d) => ({ ...d, machine: { ...d.machine, initial } }))}
            onCreate={(kind) => {
              const id = createStep(kind);
              update((d) => ({ ...d, machine: { ...d.machine, initial: id } }));
            }}
            testID="tree-initial"
          />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, backgroundColor: colors.surface },
  head: { minHeight: touchTarget, justifyContent: 'center', paddingHorizontal: space.md },
  headText: { fontFamily: fonts.semibold, fontSize: 16, color: colors.ink },
  body: { gap: space.md, padding: space.md, paddingTop: 0 },
  label: { ...type.label, color: colors.ink },
  checks: { gap: space.sm },
  error: { ...type.small, fontFamily: fonts.semibold, color: colors.danger },
});
