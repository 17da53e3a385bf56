import helmet from 'helmet';
import type { RequestHandler } from 'express';


/**
 * Headers every answer shares. Referrer-Policy is strict-origin-when-cross-origin,
 * not no-referrer: under no-referrer browsers send `Origin: null` on the app's own
 * POST/PUT/DELETE, which the API's Origin check must refuse; this policy still
 * never sends a path or query (invitation and reset tokens) to another origin.
 * HSTS only when the app is served over https, and without includeSubDomains:
 * the deployment does not own its parent domain's other hosts.
 */
function common(appOrigin: string) {
  const https = new URL(appOrigin).protocol === 'https:';
  return {
    referrerPolicy: { policy: 'strict-origin-when-cross-origin' as const },
    strictTransportSecurity: https ? { maxAge: 365 * 24 * 3600, includeSubDomains: false } : false,
    xFrameOptions: { action: 'deny' as const },
    crossOriginResourcePolicy: { policy: 'same-origin' as const },
    crossOriginOpenerPolicy: { policy: 'same-origin' as const },
  };
}

/** JSON answers never render anything: nothing may load, nothing may frame them. */
export function apiHeaders(appOrigin: string): RequestHandler {
  return helmet({
    ...common(appOrigin),
    contentSecurityPolicy: { useDefaults: false, directives: { defaultSrc: ["'none'"], frameAncestors: ["'none'"] } },
  });
}

/**
 * The web app's policy: everything from this origin, nothing from any other.
 * - script-src: the export's own files; 'wasm-unsafe-eval' lets CanvasKit (the
 *   charts' Skia engine) compile its WebAssembly, which is not eval of script.
 *   Inline scripts only by hash, read from the exported index.html.
 * - style-src 'unsafe-inline': react-native-web creates its <style> elements at
 *   run time (and expo-font its @font-face rules), with no way to give them a
 *   nonce; with hashes alone Chromium refuses them and the app is unstyled.
 *   Styles cannot run script.
 * - connect-src: the API and socket.io at the same origin (ws/wss spelled out for
 *   browsers that do not count them as 'self'); CanvasKit fetches its .wasm here too.
 * - img/font data: and blob: for what react-native-web and Skia make in memory.
 * - upgrade-insecure-requests only over https: over plain http it would send the
 *   page's own requests to an https port that does not exist.
 */
export function webHeaders(appOrigin: string, inlineScripts: () => string[]): RequestHandler {
  const origin = new URL(appOrigin);
  const https = origin.protocol === 'https:';
  const socketOrigin = `${https ? 'wss' : 'ws'}://${origin.host}`;
  return helmet({
    ...common(appOrigin),
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        defaultSrc: ["'self'"],
        // Per answer: a new export may add or drop an inline script while the API runs.
        scriptSrc: [() => ["'self'", "'wasm-unsafe-eval'", ...inlineScripts()].join(' ')],
        scriptSrcAttr: ["'none'"],
        styleSrc: ["'self'", "'unsafe-inline'"],
        imgSrc: ["'self'", 'data:', 'blob:'],
        fontSrc: ["'self'", 'data:'],
        connectSrc: ["'self'", socketOrigin],
        objectSrc: ["'none'"],
        baseUri: ["'self'"],
        formAction: ["'self'"],
        frameAncestors: ["'none'"],
        upgradeInsecureRequests: https ? [] : null,
      },
    },
  });
}
