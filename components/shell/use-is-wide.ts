import { useWindowDimensions } from 'react-native';
import { layout } from '@/components/theme';

/** True when the window is wide enough for the side rail layout. */
export function useIsWide(): boolean {
  const { width } = useWindowDimensions();
  return width >= layout.wideMinWidth;
}
