// Metro configuration: Expo's defaults, plus one preparation step for charts.
//
// Skia on the web runs on CanvasKit, a WebAssembly binary that the browser
// fetches at run time from `/canvaskit.wasm` (see components/charts). Expo
// serves and exports everything in `public/`, so the binary is copied there
// from the installed `canvaskit-wasm` package whenever Metro starts (dev
// server and `expo export` alike). Copying instead of committing keeps it in
// step with the JavaScript half of CanvasKit after every upgrade.
const fs = require('node:fs');
const path = require('node:path');
const { getDefaultConfig } = require('expo/metro-config');

function ensureCanvasKitWasm(projectRoot) {
  const source = require.resolve('canvaskit-wasm/bin/full/canvaskit.wasm', {
    paths: [path.dirname(require.resolve('@shopify/react-native-skia/package.json'))],
  });
  const target = path.join(projectRoot, 'public', 'canvaskit.wasm');
  const wanted = fs.readFileSync(source);
  const current = fs.existsSync(target) ? fs.readFileSync(target) : null;
  if (current && current.equals(wanted)) return;
  fs.mkdirSync(path.dirname(target), { recursive: true });
  fs.writeFileSync(target, wanted);
}

ensureCanvasKitWasm(__dirname);

const config = getDefaultConfig(__dirname);

// Web-only substitutions:
// - csv-parse's default build reads Node's global Buffer, which browsers lack;
//   its browser build bundles one. Shared CSV readers (e.g. the as-grown
//   measurements preview) then run in the web client too.
// - zod's locale index (every language's messages, ~250 KB before
//   compression, re-exported as `z.locales`) becomes English only: see
//   components/api/zod-locales-english.ts. Should zod move its files, the
//   paths stop matching and the full index is bundled again, nothing breaks.
const zodLocaleIndex = /[\\/]node_modules[\\/]zod[\\/]v4[\\/](classic|core)[\\/]/;
const englishOnly = path.join(__dirname, 'components', 'api', 'zod-locales-english.ts');
function webModule(context, moduleName) {
  if (moduleName === 'csv-parse/sync') return 'csv-parse/browser/esm/sync';
  if (moduleName === '../locales/index.js' && zodLocaleIndex.test(context.originModulePath)) return englishOnly;
  return moduleName;
}
const resolveDefault = config.resolver.resolveRequest;
config.resolver.resolveRequest = (context, moduleName, platform) => {
  const name = platform === 'web' ? webModule(context, moduleName) : moduleName;
  return resolveDefault ? resolveDefault(context, name, platform) : context.resolveRequest(context, name, platform);
};

module.exports = config;
