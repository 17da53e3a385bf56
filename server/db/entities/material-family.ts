import { Column, CreateDateColumn, Entity, Index, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { Team } from './team';

export type FamilyKind = 'band' | 'table' | 'constant';
export type Carrier = 'p' | 'n';

/**
 * A doping-controlled material family: how S, σ and κ follow carrier
 * concentration and temperature. `definition` holds the engine's material
 * object (SI except doping in cm⁻³ and mobility in cm²/(V·s)).
 */
@Entity('material_family')
@Index(['teamId', 'name'])
export class MaterialFamily {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'uuid' })
  teamId!: string;

  @ManyToOne(() => Team, { onDelete: 'CASCADE' })
  team?: Relation<Team>;

  @Column({ type: 'text' })
  name!: string;

  @Column({ type: 'text' })
  kind!: FamilyKind;

  @Column({ type: 'text', nullable: true })
  carrier!: Carrier | null;

  @Column({ type: 'text', default: '' })
  summary!: string;

  /** Provenance: where the numbers come from ("Hall and Seebeck on 12 samples…"). */
  @Column({ type: 'text', default: '' })
  source!: string;

  @Column({ type: 'text' })
  createdBy!: string;

  @Column({ type: 'jsonb' })
  definition!: Record<string, unknown>;

  @Column({ type: 'boolean', default: false })
  isDemo!: boolean;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;
}
