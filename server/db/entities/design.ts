import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

/** A leg design in the trade's units (mm, mm², K, W, cm⁻³); runs freeze a copy of it. */
@Entity('design')
export class Design {
  @PrimaryGeneratedColumn('uuid') id!: string;
  @Column({ type: 'uuid' }) teamId!: string;
  @Column({ type: 'text' }) name!: string;
  @Column({ type: 'text', default: '' }) notes!: string;
  @Column({ type: 'uuid' }) familyId!: string;
  @Column({ type: 'integer' }) familyVersion!: number;
  @Column({ type: 'double precision' }) lengthMm!: number;
  @Column({ type: 'double precision' }) areaMm2!: number;
  @Column({ type: 'double precision' }) hotSide!: number;
  @Column({ type: 'text' }) objective!: 'maxDeltaT' | 'maxHeatLoad' | 'maxCop';
  @Column({ type: 'double precision', default: 0 }) heatLoad!: number;
  @Column({ type: 'double precision', nullable: true }) coldSide!: number | null;
  @Column({ type: 'double precision' }) minPerCm3!: number;
  @Column({ type: 'double precision' }) maxPerCm3!: number;
  @Column({ type: 'integer' }) controlPoints!: number;
  @Column({ type: 'boolean', default: false }) monotone!: boolean;
  /** Independent starting points of the global search (each a full local optimisation). */
  @Column({ type: 'integer', default: 16 }) starts!: number;
  @Column({ type: 'double precision', default: 0 }) minZoneMm!: number;
  /** Specific contact resistivity of the cold and hot junction, µΩ·cm² (1 µΩ·cm² = 1e-10 Ω·m²). */
  @Column({ type: 'double precision', default: 0 }) coldContactMicroOhmCm2!: number;
  @Column({ type: 'double precision', default: 0 }) hotContactMicroOhmCm2!: number;
  /** Parasitic heat onto the cold side: none, a fixed load (parasiticLoadW), or radiation onto the sides (emissivity, surroundingsK). */
  @Column({ type: 'text', default: 'none' }) parasitic!: 'none' | 'fixed' | 'radiation';
  @Column({ type: 'double precision', default: 0 }) parasiticLoadW!: number;
  @Column({ type: 'double precision', default: 0 }) emissivity!: number;
  @Column({ type: 'double precision', nullable: true }) surroundingsK!: number | null;
  @Column({ type: 'text' }) createdBy!: string;
  @CreateDateColumn({ type: 'timestamptz' }) createdAt!: Date;
  @UpdateDateColumn({ type: 'timestamptz' }) updatedAt!: Date;
}
