import { Stack } from 'expo-router';
import { colors } from '@/components/theme';

const screenOptions = { headerShown: false, contentStyle: { backgroundColor: colors.background } };

/**
 * The Growth tab is a stack: the orders, then one order with its sheet,
 * measurements and timeline. Each screen draws its own header.
 */
export function GrowthStack() {
  return <Stack screenOptions={screenOptions} />;
}
