import type { ReactNode } from 'react';
import { Pressable, StyleSheet, Text, View, useWindowDimensions } from 'react-native';
import { Link, usePathname } from 'expo-router';
import { ROLE_LABELS } from '@/shared/roles';
import type { Me } from '@/shared/schemas/auth';
import { useSignOut } from '@/hooks/use-session';
import { colors, fonts, space, touchTarget, type, wideBreakpoint } from '@/components/theme';
import { activeItem, navItemsFor, type NavItem } from '@/shared/nav-items';
import { NavIcon } from './nav-icon';

/**
 * The signed-in frame: a header with the product and the person, and the
 * navigation their role may use: a bottom bar on a phone, a side rail on a
 * wide screen.
 */
export function AppShell({ me, children }: { me: Me; children: ReactNode }) {
  const { width } = useWindowDimensions();
  const wide = width >= wideBreakpoint;
  const pathname = usePathname();
  const items = navItemsFor(me.role);
  const current = activeItem(pathname, items);

  if (wide) {
    return (
      <View style={styles.wideRoot} testID="app-shell">
        <View style={styles.rail} role="navigation" accessibilityLabel="Main" testID="nav-rail">
          <Text style={styles.railBrand} accessibilityRole="header">
            Baywalk
          </Text>
          <Text style={styles.railShop} numberOfLines={2}>
            {me.shop.name}
          </Text>
          <View style={styles.railItems}>
            {items.map((item) => (
              <NavLink key={item.key} item={item} active={item === current} layout="rail" />
            ))}
          </View>
        </View>
        <View style={styles.main}>
          <Header me={me} wide />
          <View style={styles.content}>{children}</View>
        </View>
      </View>
    );
  }
  return (
    <View style={styles.phoneRoot} testID="app-shell">
      <Header me={me} wide={false} />
      <View style={styles.content}>{children}</View>
      <View style={styles.bar} role="navigation" accessibilityLabel="Main" testID="nav-bar">
        {items.map((item) => (
          <NavLink key={item.key} item={item} active={item === current} layout="bar" />
        ))}
      </View>
    </View>
  );
}

function Header({ me, wide }: { me: Me; wide: boolean }) {
  const signOut = useSignOut();
  return (
    <View style={[styles.header, wide && styles.headerWide]} testID="app-header">
      {wide ? null : (
        <Text style={styles.brand} accessibilityRole="header">
          Baywalk
        </Text>
      )}
      <View style={styles.person} testID="signed-in-person">
        <Text style={styles.personName} numberOfLines={1}>
          {me.name}
        </Text>
        <Text style={styles.personRole} numberOfLines={1}>
          {ROLE_LABELS[me.role]}
          {wide ? '' : ` · ${me.shop.name}`}
        </Text>
      </View>
      <Pressable
        accessibilityRole="button"
        testID="sign-out"
        onPress={() => signOut.mutate()}
        disabled={signOut.isPending}
        style={({ pressed }) => [styles.signOut, pressed && styles.pressed]}
      >
        <Text style={styles.signOutText}>{signOut.isPending ? 'Signing out…' : 'Sign out'}</Text>
      </Pressable>
    </View>
  );
}

function NavLink({ item, active, layout }: { item: NavItem; active: boolean; layout: 'bar' | 'rail' }) {
  const color = layout === 'rail' ? (active ? colors.ink : colors.paper) : active ? colors.accentDark : colors.inkMuted;
  return (
    <Link href={item.href} asChild>
      <Pressable
        accessibilityRole="link"
        aria-current={active ? 'page' : undefined}
        testID={`nav-${item.key}`}
        // A flat style object: Link's asChild drops style functions and arrays on web.
        style={StyleSheet.flatten([layout === 'bar' ? styles.barItem : styles.railItem, active && (layout === 'bar' ? styles.barItemActive : styles.railItemActive)])}
      >
        <NavIcon name={item.icon} color={color} />
        <Text style={[layout === 'bar' ? styles.barLabel : styles.railLabel, { color }, active && styles.activeLabel]}>{item.label}</Text>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  wideRoot: { flex: 1, flexDirection: 'row', backgroundColor: colors.paper },
  phoneRoot: { flex: 1, backgroundColor: colors.paper },
  main: { flex: 1 },
  content: { flex: 1 },
  rail: { width: 220, backgroundColor: colors.ink, paddingVertical: space.xl, paddingHorizontal: space.md, gap: space.xs },
  railBrand: { ...type.title, color: colors.paper, paddingHorizontal: space.sm },
  railShop: { ...type.small, color: colors.line, paddingHorizontal: space.sm, marginBottom: space.lg },
  railItems: { gap: space.xs },
  railItem: {
    minHeight: touchTarget + 4,
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    paddingHorizontal: space.md,
    borderRadius: 10,
  },
  railItemActive: { backgroundColor: colors.paper },
  railLabel: { fontFamily: fonts.semibold, fontSize: 17 },
  activeLabel: { fontFamily: fonts.bold },
  header: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    paddingHorizontal: space.lg,
    paddingVertical: space.sm,
    backgroundColor: colors.surface,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
  },
  headerWide: { justifyContent: 'flex-end', paddingHorizontal: space.xl },
  brand: { ...type.heading, color: colors.accentDark, flexShrink: 0 },
  person: { flex: 1, alignItems: 'flex-end', minWidth: 0 },
  personName: { fontFamily: fonts.bold, fontSize: 16, color: colors.ink },
  personRole: { ...type.small, color: colors.inkMuted },
  signOut: {
    minHeight: touchTarget,
    paddingHorizontal: space.md,
    borderRadius: 10,
    borderWidth: 2,
    borderColor: colors.accent,
    alignItems: 'center',
    justifyContent: 'center',
  },
  signOutText: { fontFamily: fonts.bold, fontSize: 15, color: colors.accentDark },
  bar: {
    flexDirection: 'row',
    backgroundColor: colors.surface,
    borderTopWidth: 1,
    borderTopColor: colors.line,
    paddingHorizontal: space.xs,
    paddingBottom: space.xs,
  },
  barItem: {
    flex: 1,
    minHeight: 60,
    alignItems: 'center',
    justifyContent: 'center',
    gap: 2,
    borderTopWidth: 3,
    borderTopColor: 'transparent',
  },
  barItemActive: { borderTopColor: colors.accent, backgroundColor: colors.accentSoft },
  barLabel: { fontFamily: fonts.semibold, fontSize: 14 },
  pressed: { opacity: 0.8 },
});
