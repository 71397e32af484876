import { StyleSheet, Text } from 'react-native';
import { GUEST_LINK_STATUS_LABELS, type GuestLinkStatus } from '@/shared/schemas/guest-links';
import { colors, fonts, radius, space } from '@/components/theme';

// Icon and word for each status: never colour alone.
const LOOK: Record<GuestLinkStatus, { icon: string; fg: string; bg: string }> = {
  not_opened: { icon: '○', fg: colors.inkMuted, bg: colors.paper },
  in_progress: { icon: '◐', fg: colors.accentDark, bg: colors.accentSoft },
  finished: { icon: '✔', fg: colors.ok, bg: colors.okSoft },
  expired: { icon: '⌛', fg: colors.caution, bg: colors.cautionSoft },
  revoked: { icon: '⊘', fg: colors.danger, bg: colors.dangerSoft },
};

/** A guest link's status as an icon and a word. */
export function LinkStatusBadge({ status, testID }: { status: GuestLinkStatus; testID?: string }) {
  const l = LOOK[status];
  return (
    <Text style={[styles.badge, { color: l.fg, backgroundColor: l.bg, borderColor: l.fg }]} testID={testID}>
      {l.icon} {GUEST_LINK_STATUS_LABELS[status]}
    </Text>
  );
}

const styles = StyleSheet.create({
  badge: { alignSelf: 'flex-start', fontFamily: fonts.bold, fontSize: 14, paddingHorizontal: space.sm, paddingVertical: 2, borderRadius: radius.sm, borderWidth: 1, overflow: 'hidden' },
});
