import { Linking, Pressable, StyleSheet, Text, View } from 'react-native';
import type { ShopContact } from '@/shared/schemas/guest-links';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';

/** The shop's phone and e-mail as large buttons a phone can call or write from. */
export function ShopContactButtons({ shop }: { shop: ShopContact }) {
  if (!shop.phone && !shop.email) return <Text style={styles.none}>Contact {shop.name} the way you usually do.</Text>;
  return (
    <View style={styles.row} testID="shop-contact">
      {shop.phone ? (
        <Pressable accessibilityRole="link" accessibilityLabel={`Call ${shop.name} on ${shop.phone}`} onPress={() => void Linking.openURL(`tel:${shop.phone!.replace(/[^\d+]/g, '')}`)} style={styles.button} testID="shop-call">
          <Text style={styles.text}>Call {shop.phone}</Text>
        </Pressable>
      ) : null}
      {shop.email ? (
        <Pressable accessibilityRole="link" accessibilityLabel={`Write to ${shop.email}`} onPress={() => void Linking.openURL(`mailto:${shop.email}`)} style={styles.button} testID="shop-email">
          <Text style={styles.text}>Write to {shop.email}</Text>
        </Pressable>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  button: {
    minHeight: touchTarget,
    paddingHorizontal: space.lg,
    borderRadius: radius.md,
    borderWidth: 2,
    borderColor: colors.accent,
    backgroundColor: colors.surface,
    justifyContent: 'center',
  },
  text: { fontFamily: fonts.bold, fontSize: 16, color: colors.accentDark },
  none: { ...type.body, color: colors.inkMuted },
});
