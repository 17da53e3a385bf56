import { Column, CreateDateColumn, Entity, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, type Relation } from 'typeorm';
import { Team } from './team';

export type FamilyKind = 'band' | 'table' | 'constant';
export type Carrier = 'p' | 'n';

/**
 * A doping-controlled material family: how S, σ and κ follow carrier
 * concentration and temperature. Its content lives in immutable versions
 * (MaterialFamilyVersion); this row names it and points at the current one.
 */
@Entity('material_family')
export class MaterialFamily {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'uuid' })
  teamId!: string;

  @ManyToOne(() => Team, { onDelete: 'CASCADE' })
  team?: Relation<Team>;

  @Column({ type: 'text' })
  name!: string;

  /** Fixed for the life of the family: a new kind is a new family. */
  @Column({ type: 'text' })
  kind!: FamilyKind;

  @Column({ type: 'text', nullable: true })
  carrier!: Carrier | null;

  @Column({ type: 'text' })
  createdBy!: string;

  @Column({ type: 'boolean', default: false })
  isDemo!: boolean;

  @Column({ type: 'integer', default: 1 })
  currentVersion!: number;

  @Column({ type: 'boolean', default: false })
  archived!: boolean;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt!: Date;
}
