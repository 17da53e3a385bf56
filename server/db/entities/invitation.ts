import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import type { Role } from '../../../shared/api/auth';

/** A single-use, expiring invitation; only the hash of its token is stored. */
@Entity('invitation')
export class Invitation {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'uuid' })
  teamId!: string;

  @Column({ type: 'text' })
  email!: string;

  @Column({ type: 'text' })
  role!: Role;

  @Column({ type: 'text' })
  tokenHash!: string;

  @Column({ type: 'text' })
  invitedBy!: string;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;

  @Column({ type: 'timestamptz' })
  expiresAt!: Date;

  @Column({ type: 'timestamptz', nullable: true })
  acceptedAt!: Date | null;

  @Column({ type: 'timestamptz', nullable: true })
  revokedAt!: Date | null;
}
