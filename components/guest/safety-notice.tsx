import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { GuestWalkState } from '@/shared/schemas/guest-links';
import { Screen } from '@/components/screen';
import { ThemedText } from '@/components/themed-text';
import { Button } from '@/components/button';
import { Notice } from '@/components/notice';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';
import { ShopContactButtons } from './shop-contact';

const POINTS = [
  {
    title: 'Engine work can hurt',
    text: 'Hot exhaust and coolant, moving belts and fans, fuel under pressure and exhaust gas can injure you. Work with the engine off and cool unless a step says otherwise, keep hands, hair and clothes clear of moving parts, never run the engine in a closed garage, and keep flames and sparks away from fuel.',
  },
  {
    title: 'Stop where a step says so',
    text: 'Some steps end by handing over. When a step says to stop, or when you are unsure, stop and call the shop or a professional. Nothing here asks you to take risks to finish.',
  },
  {
    title: 'Local rules apply',
    text: 'Follow the laws and codes where you live. Work that must be done by a licensed professional there is for them, whatever a step shows.',
  },
] as const;

/** The safety notice a guest must accept before the walk starts. */
export function SafetyNotice({ state, onAccept, busy, error }: { state: GuestWalkState; onAccept: () => void; busy: boolean; error?: string }) {
  const [read, setRead] = useState(false);
  return (
    <Screen testID="guest-safety">
      <ThemedText variant="subheading" muted>
        {state.shop.name} · for {state.customerName}
      </ThemedText>
      <ThemedText variant="title" accessibilityRole="header">
        {state.treeTitle}
      </ThemedText>
      <ThemedText>
        A step-by-step check from {state.shop.name}. Each step says what to look at or measure; your answers, readings, notes and photos go straight to the shop. You can stop and come back to this link at any time.
      </ThemedText>
      <View style={styles.box} accessibilityRole="alert">
        <Text style={styles.heading}>⚠ Before you start: safety</Text>
        {POINTS.map((p) => (
          <View key={p.title} style={styles.point}>
            <Text style={styles.pointTitle}>⚠ {p.title}</Text>
            <Text style={styles.pointText}>{p.text}</Text>
          </View>
        ))}
      </View>
      <ShopContactButtons shop={state.shop} />
      <Pressable
        role="checkbox"
        aria-checked={read}
        aria-label="I have read this, and I will stop and call where a step tells me to."
        onPress={() => setRead((r) => !r)}
        testID="guest-safety-ack"
        style={[styles.ack, read && styles.ackOn]}
      >
        <Text style={[styles.tick, read && styles.tickOn]} aria-hidden>
          {read ? '✓' : ' '}
        </Text>
        <Text style={styles.ackText}>I have read this, and I will stop and call where a step tells me to.</Text>
      </Pressable>
      {error ? (
        <Notice tone="error" title="Not started" testID="guest-safety-error">
          {error}
        </Notice>
      ) : null}
      <Button label="Start the check" onPress={onAccept} disabled={!read} busy={busy} testID="guest-safety-start" />
      <ThemedText variant="small" muted>
        Photos are stripped of their location and camera details before the shop sees them.
      </ThemedText>
    </Screen>
  );
}

const styles = StyleSheet.create({
  box: { backgroundColor: colors.cautionSoft, borderLeftWidth: 6, borderLeftColor: colors.caution, borderRadius: radius.sm, padding: space.lg, gap: space.md },
  heading: { fontFamily: fonts.bold, fontSize: 19, color: colors.caution },
  point: { gap: 2 },
  pointTitle: { fontFamily: fonts.bold, fontSize: 17, color: colors.ink },
  pointText: { ...type.body, color: colors.ink },
  ack: { minHeight: touchTarget, flexDirection: 'row', alignItems: 'center', gap: space.md, padding: space.md, borderRadius: radius.md, borderWidth: 2, borderColor: colors.line, backgroundColor: colors.surface },
  ackOn: { borderColor: colors.accent, backgroundColor: colors.accentSoft },
  tick: { width: 28, height: 28, lineHeight: 24, textAlign: 'center', borderWidth: 2, borderColor: colors.inkMuted, borderRadius: radius.sm, fontFamily: fonts.bold, fontSize: 18, color: colors.onAccent },
  tickOn: { backgroundColor: colors.accent, borderColor: colors.accent },
  ackText: { ...type.body, flex: 1, color: colors.ink },
});
