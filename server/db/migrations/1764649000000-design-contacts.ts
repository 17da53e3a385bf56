import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * A design's contacts (each junction, µΩ·cm²) and parasitic heat onto the
 * cold side (none, a fixed load in W, or radiation onto the legs' sides).
 * Defaults keep every design saved before as it was: ideal contacts, none.
 */
export class DesignContacts1764649000000 implements MigrationInterface {
  name = 'DesignContacts1764649000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE design
      ADD COLUMN cold_contact_micro_ohm_cm2 double precision NOT NULL DEFAULT 0 CHECK (cold_contact_micro_ohm_cm2 BETWEEN 0 AND 10000),
      ADD COLUMN hot_contact_micro_ohm_cm2 double precision NOT NULL DEFAULT 0 CHECK (hot_contact_micro_ohm_cm2 BETWEEN 0 AND 10000),
      ADD COLUMN parasitic text NOT NULL DEFAULT 'none' CHECK (parasitic IN ('none', 'fixed', 'radiation')),
      ADD COLUMN parasitic_load_w double precision NOT NULL DEFAULT 0 CHECK (parasitic_load_w >= 0),
      ADD COLUMN emissivity double precision NOT NULL DEFAULT 0 CHECK (emissivity BETWEEN 0 AND 1),
      ADD COLUMN surroundings_k double precision`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE design
      DROP COLUMN cold_contact_micro_ohm_cm2, DROP COLUMN hot_contact_micro_ohm_cm2, DROP COLUMN parasitic,
      DROP COLUMN parasitic_load_w, DROP COLUMN emissivity, DROP COLUMN surroundings_k`);
  }
}
