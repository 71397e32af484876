import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { STEP_KINDS, STEP_KIND_LABELS, type StepKind, type TreeDoc } from '@/trees/tree-format';
import type { Finding } from '@/trees/engine-types';
import { StepKindBadge } from '@/components/trees/step-kind-badge';
import { Button } from '@/components/button';
import { Notice } from '@/components/notice';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';
import { referrers } from './editor-model';

interface Props {
  doc: TreeDoc;
  selected?: string;
  findings: Map<string, Finding[]>;
  onSelect: (id: string) => void;
  onAdd: (kind: StepKind) => void;
  onMove: (id: string, delta: -1 | 1) => void;
  onDuplicate: (id: string) => void;
  onDelete: (id: string) => void;
}

/** The draft's steps in list order, each with its kind, title and what the checks say; tools for the chosen step. */
export function StepListPanel({ doc, selected, findings, onSelect, onAdd, onMove, onDuplicate, onDelete }: Props) {
  const [adding, setAdding] = useState(false);
  const [confirmDelete, setConfirmDelete] = useState<string>();
  const ids = Object.keys(doc.machine.states);
  return (
    <View style={styles.panel} testID="step-list">
      {ids.map((id, i) => {
        const s = doc.machine.states[id];
        const fs = findings.get(id) ?? [];
        const nErr = fs.filter((f) => f.severity === 'error').length;
        const nWarn = fs.length - nErr;
        const isSel = id === selected;
        return (
          <View key={id} style={[styles.item, isSel && styles.itemSel]}>
            <Pressable accessibilityRole="button" accessibilityState={{ selected: isSel }} onPress={() => onSelect(id)} style={styles.row} testID={`edit-step-${id}`}>
              <Text style={styles.num}>{i + 1}</Text>
              <View style={styles.grow}>
                <View style={styles.badges}>
                  <StepKindBadge kind={s.meta.kind} />
                  {id === doc.machine.initial ? <Text style={styles.start}>▶ Start</Text> : null}
                </View>
                <Text style={styles.title} numberOfLines={2}>
                  {s.meta.title || 'Untitled step'}
                </Text>
                <Text style={styles.id}>{id}</Text>
                {nErr || nWarn ? (
                  <Text style={styles.marks} testID={`step-marks-${id}`}>
                    {nErr ? <Text style={styles.err}>✖ {nErr === 1 ? '1 problem' : `${nErr} problems`} </Text> : null}
                    {nWarn ? <Text style={styles.warn}>⚠ {nWarn === 1 ? '1 warning' : `${nWarn} warnings`}</Text> : null}
                  </Text>
                ) : (
                  <Text style={styles.ok}>✔ No problems</Text>
                )}
              </View>
            </Pressable>
            {isSel ? (
              <View style={styles.tools}>
                <Tool label="↑ Up" onPress={() => onMove(id, -1)} disabled={i === 0} testID="step-move-up" />
                <Tool label="↓ Down" onPress={() => onMove(id, 1)} disabled={i === ids.length - 1} testID="step-move-down" />
                <Tool label="Duplicate" onPress={() => onDuplicate(id)} testID="step-duplicate" />
                <Tool label="Delete…" onPress={() => setConfirmDelete(id)} testID="step-delete" danger />
              </View>
            ) : null}
            {confirmDelete === id ? <DeleteConfirm doc={doc} id={id} onCancel={() => setConfirmDelete(undefined)} onDelete={() => (setConfirmDelete(undefined), onDelete(id))} /> : null}
          </View>
        );
      })}
      {adding ? (
        <View style={styles.add} testID="add-step-kinds">
          <Text style={styles.addHead}>Add a step of kind:</Text>
          <View style={styles.tools}>
            {STEP_KINDS.map((k) => (
              <Tool key={k} label={`+ ${STEP_KIND_LABELS[k]}`} onPress={() => (setAdding(false), onAdd(k))} testID={`add-step-${k}`} />
            ))}
            <Tool label="Cancel" onPress={() => setAdding(false)} />
          </View>
        </View>
      ) : (
        <Button label="+ Add a step" kind="secondary" onPress={() => setAdding(true)} testID="add-step" />
      )}
    </View>
  );
}

function DeleteConfirm({ doc, id, onCancel, onDelete }: { doc: TreeDoc; id: string; onCancel: () => void; onDelete: () => void }) {
  const from = referrers(doc, id);
  return (
    <View style={styles.confirm} testID="delete-confirm">
      <Notice tone="caution" title={`Delete the step “${doc.machine.states[id].meta.title || id}”?`}>
        {from.length ? (
          <View style={styles.refs}>
            <Text style={styles.refText}>These steps point at it; their answers will need a new step:</Text>
            {from.map((r, i) => (
              <Text key={i} style={styles.refText} testID={`delete-referrer-${r.stepId}`}>
                • {r.title || r.stepId} ({r.stepId}): “{r.answer}”
              </Text>
            ))}
          </View>
        ) : (
          <Text style={styles.refText}>No other step points at it.</Text>
        )}
      </Notice>
      <View style={styles.tools}>
        <Button label="Delete the step" kind="danger" onPress={onDelete} testID="delete-confirm-yes" />
        <Button label="Keep it" kind="secondary" onPress={onCancel} testID="delete-confirm-no" />
      </View>
    </View>
  );
}

function Tool({ label, onPress, disabled, danger, testID }: { label: string; onPress: () => void; disabled?: boolean; danger?: boolean; testID?: string }) {
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityState={{ disabled: !!disabled }}
      onPress={disabled ? undefined : onPress}
      style={({ pressed }) => [styles.tool, disabled && styles.off, pressed && styles.pressed]}
      testID={testID}
    >
      <Text style={[styles.toolText, danger && styles.dangerText]}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  panel: { gap: space.sm },
  item: { borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, backgroundColor: colors.surface, overflow: 'hidden' },
  itemSel: { borderColor: colors.accent, borderWidth: 2 },
  row: { flexDirection: 'row', gap: space.md, padding: space.md, minHeight: touchTarget },
  num: { fontFamily: fonts.bold, fontSize: 15, color: colors.inkMuted, minWidth: 22 },
  grow: { flex: 1, gap: 2 },
  badges: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  start: { fontFamily: fonts.semibold, fontSize: 14, color: colors.accentDark },
  title: { ...type.label, color: colors.ink },
  id: { ...type.small, color: colors.inkMuted },
  marks: { ...type.small },
  err: { color: colors.danger, fontFamily: fonts.semibold },
  warn: { color: colors.caution, fontFamily: fonts.semibold },
  ok: { ...type.small, color: colors.ok },
  tools: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, paddingHorizontal: space.md, paddingBottom: space.md },
  tool: { minHeight: touchTarget, minWidth: touchTarget, paddingHorizontal: space.md, justifyContent: 'center', alignItems: 'center', borderRadius: radius.md, borderWidth: 1.5, borderColor: colors.accent, backgroundColor: colors.surface },
  toolText: { fontFamily: fonts.semibold, fontSize: 15, color: colors.accentDark },
  dangerText: { color: colors.danger },
  off: { opacity: 0.4 },
  pressed: { opacity: 0.8 },
  add: { gap: space.sm, borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, paddingTop: space.md, backgroundColor: colors.surface },
  addHead: { ...type.label, color: colors.ink, paddingHorizontal: space.md },
  confirm: { gap: space.sm, paddingBottom: space.md },
  refs: { gap: space.xs },
  refText: { ...type.small, color: colors.ink, paddingHorizontal: space.md },
});
