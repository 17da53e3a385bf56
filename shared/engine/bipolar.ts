/**
 * Where a leg sits relative to bipolar conduction: the largest share of the
 * current that minority carriers carry anywhere along a solved profile
 * (σ_minority/σ at each profile point's doping and temperature).
 *
 * Cheap — one charge-neutrality solve per profile point (~0.5 µs) — so the
 * API computes it for every run it lists, from the stored case and result.
 */
import { bandFamily } from './band-model';
import type { MaterialInput } from './case-schema';
import type { MaterialFamily } from './material-family';

/** Minority share of the current above which a point counts as bipolar (5 %). */
export const BIPOLAR_SHARE = 0.05;

export type BipolarPoint = {
  /** σ_minority/σ at the point where it is largest, 0–1. */
  share: number;
  /** Position from the cold end [m], temperature [K] and doping [cm⁻³] there. */
  x: number;
  temperature: number;
  perCm3: number;
  /** Whether that point is an end of the leg (the profile's first or last point). */
  end: 'cold' | 'hot' | null;
  /** share > BIPOLAR_SHARE. */
  bipolar: boolean;
};

export type ProfileLike = { x: readonly number[]; temperature: readonly number[]; perCm3?: readonly number[] };

/** The largest minority share along a profile of a family; null when the family has no minority band or the profile no doping. */
export function largestMinorityShare(family: MaterialFamily, profile: ProfileLike): BipolarPoint | null {
  const share = family.minorityShare;
  const doping = profile.perCm3;
  if (!share || !doping || doping.length !== profile.temperature.length) return null;
  let best: BipolarPoint | null = null;
  for (let i = 0; i < doping.length; i++) {
    const s = share.call(family, Math.log10(doping[i]), profile.temperature[i]);
    if (!Number.isFinite(s)) continue;
    const end = i === 0 ? 'cold' : i === doping.length - 1 ? 'hot' : null;
    if (!best || s > best.share) best = { share: s, x: profile.x[i], temperature: profile.temperature[i], perCm3: doping[i], end, bipolar: s > BIPOLAR_SHARE };
  }
  return best;
}

/** As largestMinorityShare, from a stored material definition (null unless it is a band model with a minority band). */
export function bipolarOfProfile(material: MaterialInput | undefined, profile: ProfileLike | undefined): BipolarPoint | null {
  if (!material || material.kind !== 'band' || !material.minority || !profile) return null;
  return largestMinorityShare(bandFamily(material), profile);
}
