/**
 * The one error type for bad input: it names the offending field by its path
 * in the case (`material.effectiveMass`, `doping.perCm3[3]`,
 * `segments[1].fraction`), so the CLI, the API and the form can point at it.
 */
export class CaseError extends Error {
  readonly field: string;

  constructor(field: string, message: string) {
    super(`${field}: ${message}`);
    this.name = 'CaseError';
    this.field = field;
  }
}
