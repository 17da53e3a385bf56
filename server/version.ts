import { readFileSync } from 'node:fs';
import { join } from 'node:path';

/** The package version, read once (tsx runs sources, so there is no build stamp). */
export const version: string = (JSON.parse(readFileSync(join(__dirname, '..', 'package.json'), 'utf8')) as { version: string }).version;
