/** One prefixed line per event, so interleaved child output stays readable. */
export function log(source: string, message: string): void {
  process.stdout.write(`[${source}] ${message}\n`);
}
