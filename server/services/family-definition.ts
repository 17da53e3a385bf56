import type { MaterialInput } from '../../shared/engine';
import { ValidationError } from '../http/errors';
import { engineVerdict } from './engine-check';
import { judge, type EngineVerdict } from './engine-judge';

/** The carrier a verdict found, or the engine's refusal with its field (`material.rows[3]`) as the request's (`definition.rows[3]`). */
function carrierOf(verdict: EngineVerdict, field: string): 'p' | 'n' {
  if (verdict.ok) return verdict.carrier === 'n' ? 'n' : 'p';
  const inner = verdict.field.replace(/^material\.?/, '');
  throw new ValidationError([{ field: inner ? `${field}.${inner}` : field, message: verdict.message }]);
}

/**
 * Builds the engine family once before anything is saved, so a definition the
 * engine cannot use (ragged table, mixed signs…) never reaches the database.
 * Returns the carrier implied by the definition.
 */
export function checkDefinition(definition: MaterialInput, field = 'definition'): 'p' | 'n' {
  return carrierOf(judge({ kind: 'family', definition }), field);
}

/** The same check for a request: a measured table is built in an API thread (up to a few hundred ms at the size caps). */
export async function checkDefinitionOffLoop(definition: MaterialInput, field = 'definition'): Promise<'p' | 'n'> {
  return carrierOf(await engineVerdict({ kind: 'family', definition }, field), field);
}
