// zod's locale index as the web build sees it (metro.config.js): English
// only. The full index bundles every language zod speaks, a fifth of the
// app's first download, and the app never switches zod's language.
export { default as en } from 'zod/v4/locales/en.js';
