import { z } from 'zod';

// zod compiles object parsers with `new Function` when it may, and probes
// whether it may as soon as the first object schema is built. The web app's
// Content-Security-Policy forbids eval, so the probe would fail and be
// reported as a policy violation on every page; jitless parsing is
// what the browser would fall back to anyway. Imported first by the entry.
z.config({ jitless: true });
