import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { ROLES, ROLE_LABELS, type Role } from '@/shared/roles';
import type { Person } from '@/shared/schemas/people';
import { useUpdatePerson } from '@/hooks/use-people';
import { Button } from '@/components/button';
import { Notice } from '@/components/notice';
import { SegmentedChoice } from '@/components/forms/segmented-choice';
import { colors, fonts, space, type } from '@/components/theme';
import { shortDateTime } from './format';

const ROLE_CHOICES = ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }));

/** Column widths of the wide table; the header uses the same. */
export const COLUMNS = { name: 2, email: 2.4, role: 1.4, status: 1.1, last: 1.6, actions: 2.2 } as const;

/** One person: a table row on a wide screen, a card on a phone, with role change and (de)activation. */
export function PersonRow({ person, isMe, wide }: { person: Person; isMe: boolean; wide: boolean }) {
  const update = useUpdatePerson();
  const [mode, setMode] = useState<'idle' | 'role' | 'confirm'>('idle');
  const change = (c: { role?: Role; active?: boolean }) =>
    update.mutate({ id: person.id, change: c }, { onSuccess: () => setMode('idle') });

  const status = (
    <Text style={[styles.status, { color: person.active ? colors.ok : colors.danger }]}>{person.active ? '✔ Active' : '⏸ Deactivated'}</Text>
  );
  const actions = (
    <View style={styles.actions}>
      <Button label="Change role" kind="secondary" onPress={() => setMode(mode === 'role' ? 'idle' : 'role')} testID={`change-role-${person.id}`} />
      {person.active ? (
        <Button label="Deactivate" kind="secondary" onPress={() => setMode('confirm')} testID={`deactivate-${person.id}`} />
      ) : (
        <Button label="Reactivate" kind="secondary" onPress={() => change({ active: true })} busy={update.isPending} testID={`reactivate-${person.id}`} />
      )}
    </View>
  );
  const name = (
    <Text style={styles.name} numberOfLines={2}>
      {person.name}
      {isMe ? <Text style={styles.you}> (you)</Text> : null}
    </Text>
  );

  return (
    <View style={[styles.wrap, !person.active && styles.inactive]} testID={`person-${person.email}`}>
      {wide ? (
        <View style={styles.tableRow}>
          <View style={{ flex: COLUMNS.name }}>{name}</View>
          <Text style={[styles.cell, { flex: COLUMNS.email }]} numberOfLines={1}>
            {person.email}
          </Text>
          <Text style={[styles.cell, { flex: COLUMNS.role }]}>{ROLE_LABELS[person.role]}</Text>
          <View style={{ flex: COLUMNS.status }}>{status}</View>
          <Text style={[styles.cell, { flex: COLUMNS.last }]}>{shortDateTime(person.lastSignInAt)}</Text>
          <View style={{ flex: COLUMNS.actions }}>{actions}</View>
        </View>
      ) : (
        <View style={styles.card}>
          {name}
          <Text style={styles.cell}>{person.email}</Text>
          <Text style={styles.cell}>
            {ROLE_LABELS[person.role]} · last sign-in {shortDateTime(person.lastSignInAt)}
          </Text>
          {status}
          {actions}
        </View>
      )}
      {mode === 'role' ? (
        <View style={styles.panel}>
          <SegmentedChoice
            label={`New role for ${person.name}`}
            options={ROLE_CHOICES}
            value={person.role}
            onChange={(role) => (role === person.role ? setMode('idle') : change({ role }))}
            testID={`role-choice-${person.id}`}
          />
        </View>
      ) : null}
      {mode === 'confirm' ? (
        <View style={styles.panel} testID={`confirm-deactivate-${person.id}`}>
          <Notice tone="caution" title={`Deactivate ${person.name}?`}>
            {`${isMe ? 'You are' : 'They are'} signed out at once and cannot sign in until reactivated. Their records stay.`}
          </Notice>
          <View style={styles.actions}>
            <Button label="Yes, deactivate" kind="danger" onPress={() => change({ active: false })} busy={update.isPending} testID={`confirm-yes-${person.id}`} />
            <Button label="Keep active" kind="secondary" onPress={() => setMode('idle')} />
          </View>
        </View>
      ) : null}
      {update.isError ? (
        <Notice tone="error" title="Not changed" testID={`person-error-${person.id}`}>
          {update.error.message}
        </Notice>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { borderBottomWidth: 1, borderBottomColor: colors.line, paddingVertical: space.md, gap: space.md },
  inactive: { opacity: 0.85 },
  tableRow: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  card: { gap: space.xs },
  name: { fontFamily: fonts.bold, fontSize: 17, color: colors.ink },
  you: { fontFamily: fonts.regular, color: colors.inkMuted },
  cell: { ...type.body, fontSize: 16, color: colors.ink },
  status: { fontFamily: fonts.semibold, fontSize: 16 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  panel: { gap: space.md, paddingLeft: space.md, borderLeftWidth: 3, borderLeftColor: colors.accent },
});
