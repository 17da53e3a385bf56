/**
 * What happens at and around a leg besides the leg's own conduction: the
 * electrical contacts at its two junctions and the parasitic heat that
 * reaches the cold side without being pumped from the load (see PHYSICS.md,
 * "Contacts" and "Parasitic heat"). The case fields, their normal form and
 * the few terms the integrator and the shooting guesses need.
 */
import { z } from 'zod';
import { STEFAN_BOLTZMANN } from './constants';

/** Specific electrical contact resistivity of each junction [Ω·m²]. */
export type Contacts = { cold: number; hot: number };

/**
 * Heat reaching the leg from outside besides the load.
 * - heatLoad: a fixed load onto the cold junction [W per leg] (gas
 *   conduction, wires, radiation onto the cold stage);
 * - radiation: the leg's sides exchange radiation with surroundings at
 *   `surroundings` [K] with emissivity ε, distributed along the leg
 *   (perimeter of a square cross-section, 4√A).
 */
export type Parasitic = { heatLoad?: number; radiation?: { emissivity: number; surroundings: number } };

/** Contacts and parasitic heat of one leg; absent parts are ideal (0, none). */
export type LegEnds = { contacts?: Contacts; parasitic?: Parasitic };

const number = (what: string) => z.number({ error: (issue) => (issue.input === undefined ? `${what} is required` : `${what} must be a finite number`) });

const resistivity = (what: string) =>
  number(what)
    .min(0, { error: `${what} must not be negative` })
    .max(1e-6, { error: `${what} above 1e-6 Ω·m² is implausible: it is in Ω·m² (good contacts are 1e-10 to 1e-9 Ω·m²; 1 Ω·cm² = 1e-4 Ω·m²)` });

/**
 * Specific electrical contact resistivity [Ω·m²]: one number for both
 * junctions (the form older cases use), or `{cold, hot}`. Good contacts are
 * 1e-10 to 1e-9 Ω·m² (1–10 µΩ·cm²); above 1e-6 Ω·m² is a unit slip.
 */
export const contactResistivitySchema = z.union([resistivity('contactResistivity'), z.strictObject({ cold: resistivity('cold'), hot: resistivity('hot') })], {
  error: 'contactResistivity must be a number (Ω·m², both junctions) or {cold, hot}',
});

export const parasiticSchema = z.strictObject(
  {
    heatLoad: number('heatLoad')
      .min(0, { error: 'heatLoad must not be negative' })
      .max(10, { error: 'heatLoad above 10 W onto one leg is implausible: it is in watts per leg' })
      .optional(),
    radiation: z
      .strictObject({
        emissivity: number('emissivity').min(0, { error: 'emissivity must be between 0 and 1' }).max(1, { error: 'emissivity must be between 0 and 1' }),
        surroundings: number('surroundings').gt(0, { error: 'surroundings must be greater than 0 K' }).max(2000, { error: 'surroundings above 2000 K is implausible: temperatures are in kelvin' }),
      })
      .optional(),
  },
  { error: 'parasitic must be {heatLoad (W)} and/or {radiation: {emissivity, surroundings (K)}}' },
);

export type ContactResistivityInput = z.infer<typeof contactResistivitySchema>;
export type ParasiticInput = z.infer<typeof parasiticSchema>;

/** The normal form of the case fields; undefined when everything is ideal (the leg then runs exactly as before). */
export function legEndsOf(contactResistivity: ContactResistivityInput | undefined, parasitic: ParasiticInput | undefined): LegEnds | undefined {
  const contacts = typeof contactResistivity === 'number' ? { cold: contactResistivity, hot: contactResistivity } : contactResistivity;
  const hasContacts = contacts !== undefined && (contacts.cold > 0 || contacts.hot > 0);
  const heatLoad = parasitic?.heatLoad ?? 0;
  const radiation = parasitic?.radiation && parasitic.radiation.emissivity > 0 ? parasitic.radiation : undefined;
  const hasParasitic = heatLoad > 0 || radiation !== undefined;
  if (!hasContacts && !hasParasitic) return undefined;
  return {
    ...(hasContacts ? { contacts: { cold: contacts.cold, hot: contacts.hot } } : {}),
    ...(hasParasitic ? { parasitic: { ...(heatLoad > 0 ? { heatLoad } : {}), ...(radiation ? { radiation: { ...radiation } } : {}) } } : {}),
  };
}

/** Back to case fields (for a stored run's legs, module cases); {} when ideal. */
export function legEndsFields(ends: LegEnds | undefined): { contactResistivity?: Contacts; parasitic?: Parasitic } {
  return {
    ...(ends?.contacts ? { contactResistivity: { ...ends.contacts } } : {}),
    ...(ends?.parasitic ? { parasitic: { ...ends.parasitic } } : {}),
  };
}

/** The leg's cross-section perimeter [m]: a square of area A. */
export function perimeterOf(area: number): number {
  return 4 * Math.sqrt(area);
}

/**
 * Radiation onto the sides per unit cross-section and length [W/m³] at
 * temperature T: ε·σ_SB·(P/A)·(Ts⁴ − T⁴) — heat gained where the leg is
 * colder than its surroundings. Returned as {coefficient, ts4} so the
 * integrator evaluates coefficient·(ts4 − T⁴) with no allocation.
 */
export function radiationTerm(ends: LegEnds | undefined, area: number): { coefficient: number; ts4: number } {
  const r = ends?.parasitic?.radiation;
  if (!r || r.emissivity <= 0) return { coefficient: 0, ts4: 0 };
  return { coefficient: (r.emissivity * STEFAN_BOLTZMANN * perimeterOf(area)) / area, ts4: r.surroundings ** 4 };
}

/**
 * The jump of q at the cold junction [W/m²] for current density J: the cold
 * contact's Joule heat J²ρc and the fixed parasitic load per unit area. The
 * heat entering the leg is the heat drawn from the load plus this.
 */
export function coldJump(ends: LegEnds | undefined, area: number, J: number): number {
  return J * J * (ends?.contacts?.cold ?? 0) + (ends?.parasitic?.heatLoad ?? 0) / area;
}

/** Total contact resistivity of both junctions [Ω·m²] (the leg's resistance grows by this / A). */
export function contactSum(ends: LegEnds | undefined): number {
  return (ends?.contacts?.cold ?? 0) + (ends?.contacts?.hot ?? 0);
}

/** The contacts and parasitic heat of a stored case (JSON as run); undefined when ideal or unreadable (older cases have neither field). */
export function legEndsOfCase(caseJson: unknown): LegEnds | undefined {
  if (typeof caseJson !== 'object' || caseJson === null) return undefined;
  const c = caseJson as { contactResistivity?: unknown; parasitic?: unknown };
  const contacts = contactResistivitySchema.optional().safeParse(c.contactResistivity);
  const parasitic = parasiticSchema.optional().safeParse(c.parasitic);
  return legEndsOf(contacts.success ? contacts.data : undefined, parasitic.success ? parasitic.data : undefined);
}
