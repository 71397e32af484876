import { useState } from 'react';
import { Platform, Pressable, StyleSheet, Text, View } from 'react-native';
import { Link, useRouter } from 'expo-router';
import { treeCreateSchema } from '@/shared/schemas/tree-authoring';
import { INSTALL_TYPES, INSTALL_TYPE_LABELS, SYMPTOMS, SYMPTOM_LABELS, type InstallType, type Symptom } from '@/trees/tree-format';
import type { Finding } from '@/trees/engine-types';
import { ApiError } from '@/hooks/api-client';
import { useCreateTree, useImportTree } from '@/hooks/use-tree-drafts';
import { useZodForm } from '@/components/forms/use-zod-form';
import { TextField } from '@/components/forms/text-field';
import { SegmentedChoice } from '@/components/forms/segmented-choice';
import { FormActions } from '@/components/forms/form-actions';
import { CheckboxRow } from '@/components/jobs/checkbox-row';
import { Screen } from '@/components/screen';
import { ThemedText } from '@/components/themed-text';
import { Notice } from '@/components/notice';
import { Button } from '@/components/button';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';
import { FindingList } from './findings-panel';

type Values = { title: string; symptom: Symptom | undefined; installTypes: InstallType[]; summary: string };

/** /trees/new: a new tree (opened as a draft), or a tree file imported as a draft. */
export function TreeCreate() {
  const router = useRouter();
  const create = useCreateTree();
  const form = useZodForm(treeCreateSchema, { title: '', symptom: undefined, installTypes: [], summary: '' } as Values);
  const { values, setValue, errors } = form;
  const submit = () => {
    const input = form.validate();
    if (!input) return;
    create.mutate(input, { onSuccess: (d) => router.replace(`/trees/${d.treeId}/edit`), onError: form.showError });
  };
  return (
    <Screen testID="tree-create">
      <Link href="/trees" asChild>
        <Pressable accessibilityRole="link" style={styles.back}>
          <Text style={styles.backText}>‹ All trees</Text>
        </Pressable>
      </Link>
      <ThemedText variant="title" accessibilityRole="header">
        New tree
      </ThemedText>
      <ThemedText muted>Start with what the car came back with. The tree opens as a draft with a first question to write; nobody walks it until you publish.</ThemedText>
      <TextField label="Title" placeholder="Surging idle after a throttle-body swap" value={values.title} onChangeText={(t) => setValue('title', t)} error={errors.title} testID="new-tree-title" />
      <SegmentedChoice label="Symptom" options={SYMPTOMS.map((s) => ({ value: s, label: SYMPTOM_LABELS[s] }))} value={values.symptom} onChange={(s) => setValue('symptom', s)} error={errors.symptom} testID="new-tree-symptom" />
      <Text style={styles.label}>After which installs</Text>
      <View style={styles.checks}>
        {INSTALL_TYPES.map((t) => (
          <CheckboxRow
            key={t}
            label={INSTALL_TYPE_LABELS[t]}
            checked={values.installTypes.includes(t)}
            onChange={(on) => setValue('installTypes', on ? [...values.installTypes, t] : values.installTypes.filter((x) => x !== t))}
            testID={`new-tree-install-${t}`}
          />
        ))}
      </View>
      {errors.installTypes ? <Text style={styles.error}>✖ {errors.installTypes}</Text> : null}
      <TextField label="Summary (optional)" value={values.summary} multiline onChangeText={(t) => setValue('summary', t)} error={errors.summary} testID="new-tree-summary" />
      <FormActions formError={form.formError} testID="new-tree">
        <Button label="Create and open the draft" onPress={submit} busy={create.isPending} testID="new-tree-submit" />
      </FormActions>
      <ImportSection onImported={(id) => router.replace(`/trees/${id}/edit`)} />
    </Screen>
  );
}

/** Import a Baywalk tree file: chosen from disk (web) or pasted. Refusals list every problem by step. */
function ImportSection({ onImported }: { onImported: (treeId: number) => void }) {
  const imp = useImportTree();
  const [text, setText] = useState('');
  const [refusal, setRefusal] = useState<{ message: string; findings: Finding[] }>();
  const send = (fileText: string, fileName?: string) => {
    setRefusal(undefined);
    imp.mutate(
      { text: fileText, fileName },
      {
        onSuccess: (a) => onImported(a.treeId),
        onError: (err) => {
          const details = err instanceof ApiError ? (err.details as { findings?: Finding[] } | undefined) : undefined;
          const fieldText = err instanceof ApiError ? Object.values(err.fields)[0] : undefined;
          setRefusal({ message: fieldText ?? err.message, findings: details?.findings ?? [] });
        },
      },
    );
  };
  const pick = () => {
    const input = document.createElement('input');
    input.type = 'file';
    input.accept = '.json,application/json';
    input.onchange = async () => {
      const file = input.files?.[0];
      if (file) send(await file.text(), file.name);
    };
    input.click();
  };
  return (
    <View style={styles.box} testID="tree-import">
      <ThemedText variant="heading" accessibilityRole="header">
        Or import a tree file
      </ThemedText>
      <ThemedText muted>A tree exported from Baywalk (format baywalk-tree/1). It is checked first and becomes a draft; a tree with the same id gets a new draft.</ThemedText>
      {Platform.OS === 'web' ? <Button label="Choose a file…" kind="secondary" onPress={pick} busy={imp.isPending} testID="import-pick" /> : null}
      <TextField label="Or paste the file's text" value={text} onChangeText={setText} multiline autoCapitalize="none" autoCorrect={false} testID="import-text" />
      <Button label="Import the pasted text" kind="secondary" onPress={() => send(text)} disabled={!text.trim()} busy={imp.isPending} testID="import-submit" />
      {refusal ? (
        <Notice tone="error" title="Not imported" testID="import-error">
          <View style={styles.col}>
            <Text style={styles.body}>{refusal.message}</Text>
            {refusal.findings.length ? <FindingList findings={refusal.findings} testID="import-findings" /> : null}
          </View>
        </Notice>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  back: { minHeight: touchTarget, justifyContent: 'center', alignSelf: 'flex-start' },
  backText: { fontFamily: fonts.semibold, fontSize: 17, color: colors.accentDark },
  label: { ...type.label, color: colors.ink },
  checks: { gap: space.sm },
  error: { ...type.small, fontFamily: fonts.semibold, color: colors.danger },
  box: { gap: space.md, padding: space.lg, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface, marginTop: space.lg },
  col: { gap: space.sm },
  body: { ...type.body, color: colors.ink },
});
