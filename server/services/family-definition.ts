import { CaseError, familyFromMaterial, type MaterialInput } from '../../shared/engine';
import { ValidationError } from '../http/errors';

/**
 * Builds the engine family once before anything is saved, so a definition the
 * engine cannot use (ragged table, mixed signs…) never reaches the database.
 * Returns the carrier implied by the definition.
 */
export function checkDefinition(definition: MaterialInput, field = 'definition'): 'p' | 'n' {
  try {
    const family = familyFromMaterial(definition);
    return family.sign < 0 ? 'n' : 'p';
  } catch (err) {
    if (err instanceof CaseError) {
      const inner = err.field.replace(/^material\.?/, '');
      throw new ValidationError([{ field: inner ? `${field}.${inner}` : field, message: err.message }]);
    }
    throw err;
  }
}
