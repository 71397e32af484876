import { useFonts } from 'expo-font';
import { fonts } from '@/components/theme';

/** Whether the shipped Nunito Sans faces are ready (or failed: text then falls back rather than never showing). */
export function useAppFonts(): boolean {
  const [loaded, error] = useFonts({
    [fonts.regular]: require('@/assets/fonts/NunitoSans_400Regular.ttf'),
    [fonts.semibold]: require('@/assets/fonts/NunitoSans_600SemiBold.ttf'),
    [fonts.bold]: require('@/assets/fonts/NunitoSans_700Bold.ttf'),
  });
  return loaded || !!error;
}
