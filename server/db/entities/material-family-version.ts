import { Column, CreateDateColumn, Entity, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { MaterialFamily } from './material-family';

/**
 * One immutable version of a family. `definition` is the engine's material
 * object (SI, except doping in cm⁻³ and mobility in cm²/(V·s)). A database
 * trigger refuses updates: editing a family writes the next version.
 */
@Entity('material_family_version')
export class MaterialFamilyVersion {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'uuid' })
  familyId!: string;

  @ManyToOne(() => MaterialFamily, { onDelete: 'CASCADE' })
  family?: Relation<MaterialFamily>;

  @Column({ type: 'integer' })
  version!: number;

  @Column({ type: 'jsonb' })
  definition!: Record<string, unknown>;

  @Column({ type: 'text', default: '' })
  summary!: string;

  /** Provenance: where the numbers come from ("Hall and Seebeck on 12 samples…"). */
  @Column({ type: 'text', default: '' })
  source!: string;

  @Column({ type: 'text' })
  createdBy!: string;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;
}
