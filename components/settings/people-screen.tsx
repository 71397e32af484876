import { ActivityIndicator, StyleSheet, Text, View, useWindowDimensions } from 'react-native';
import { usePeople } from '@/hooks/use-people';
import { useMe } from '@/hooks/use-session';
import { Screen } from '@/components/screen';
import { ThemedText } from '@/components/themed-text';
import { colors, fonts, radius, space, wideBreakpoint } from '@/components/theme';
import { InviteForm } from './invite-form';
import { InvitationsList } from './invitations-list';
import { COLUMNS, PersonRow } from './person-row';
import { SettingsNav } from './settings-nav';
import { LoadError } from '@/components/load-error';

/** Settings → People (owner): everyone in the shop, invitations, roles and (de)activation. */
export function PeopleScreen() {
  const me = useMe();
  const people = usePeople();
  const { width } = useWindowDimensions();
  const wide = width >= wideBreakpoint;

  return (
    <Screen testID="people-screen">
      <SettingsNav current="people" />
      <ThemedText variant="title" accessibilityRole="header">
        People
      </ThemedText>
      {people.isPending ? <ActivityIndicator color={colors.accent} /> : null}
      {people.isError ? (
        <LoadError title="People not loaded" error={people.error} onRetry={people.refetch} busy={people.isFetching} />
      ) : null}
      {people.data ? (
        <View style={styles.list} testID={wide ? 'people-table' : 'people-list'} accessibilityRole={wide ? undefined : 'list'}>
          {wide ? (
            <View style={styles.headRow}>
              {(
                [
                  ['Name', COLUMNS.name],
                  ['E-mail', COLUMNS.email],
                  ['Role', COLUMNS.role],
                  ['Status', COLUMNS.status],
                  ['Last sign-in', COLUMNS.last],
                  ['', COLUMNS.actions],
                ] as const
              ).map(([label, flex]) => (
                <Text key={label || 'actions'} style={[styles.head, { flex }]}>
                  {label}
                </Text>
              ))}
            </View>
          ) : null}
          {people.data.map((p) => (
            <PersonRow key={p.id} person={p} isMe={p.id === me?.id} wide={wide} />
          ))}
        </View>
      ) : null}
      <InvitationsList />
      <InviteForm />
    </Screen>
  );
}

const styles = StyleSheet.create({
  col: { gap: space.md },
  list: { backgroundColor: colors.surface, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.line, paddingHorizontal: space.lg },
  headRow: { flexDirection: 'row', gap: space.md, paddingVertical: space.md, borderBottomWidth: 2, borderBottomColor: colors.line },
  head: { fontFamily: fonts.bold, fontSize: 14, color: colors.inkMuted, textTransform: 'uppercase', letterSpacing: 0.5 },
});
