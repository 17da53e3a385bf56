import { Stack } from 'expo-router';
import { colors } from '@/components/theme';

const screenOptions = { headerShown: false, contentStyle: { backgroundColor: colors.background } };

/**
 * The Materials tab is a stack: the list, then a family, its edit form, the
 * new-family form and the upload. Each screen draws its own header (with a
 * back link), so the native header is off.
 */
export function MaterialsStack() {
  return <Stack screenOptions={screenOptions} />;
}
