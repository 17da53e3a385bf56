// The app's entry (package.json "main"): what must run before any other
// module, in this order, then expo-router's own entry.
import './api/zod-config';
import './start-fonts';
import 'expo-router/entry';
