import { CaseError, familyFromMaterial, type MaterialInput } from '../../shared/engine';
import { ValidationError } from '../http/errors';
import { engineVerdict } from './engine-check';

/** The engine's field (`material.rows[3]`) as the request's (`definition.rows[3]`). */
function refusal(field: string, engineField: string, message: string): ValidationError {
  const inner = engineField.replace(/^material\.?/, '');
  return new ValidationError([{ field: inner ? `${field}.${inner}` : field, message }]);
}

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
    if (err instanceof CaseError) throw refusal(field, err.field, err.message);
    throw err;
  }
}

/**
 * The same check for a request: a measured table is built in an API thread
 * (its spline takes up to a few hundred milliseconds at the size caps), a
 * model here (microseconds).
 */
export async function checkDefinitionOffLoop(definition: MaterialInput, field = 'definition'): Promise<'p' | 'n'> {
  if (definition.kind !== 'table') return checkDefinition(definition, field);
  const verdict = await engineVerdict({ kind: 'family', definition }, field);
  if (!verdict.ok) throw refusal(field, verdict.field, verdict.message);
  return verdict.carrier === 'n' ? 'n' : 'p';
}
