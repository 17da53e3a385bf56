import { loadAsync } from 'expo-font';
import { appFonts } from './fonts';

// Start fetching the fonts as soon as the bundle runs, while the router and
// the first screen load, rather than when the root layout first renders and
// waits for them: its useFonts finds these same loads in flight. A failure is
// the root layout's to handle (it renders with fallback fonts), not this one's.
loadAsync(appFonts).catch(() => undefined);
