import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** Step one of a sign-up, waiting for its mailed single-use link; only the hash of the token is stored. */
@Entity('sign_up_request')
export class SignUpRequest {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'text' })
  email!: string;

  @Column({ type: 'text' })
  displayName!: string;

  @Column({ type: 'text' })
  teamName!: string;

  @Column({ type: 'text' })
  tokenHash!: string;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;

  @Column({ type: 'timestamptz' })
  expiresAt!: Date;

  @Column({ type: 'timestamptz', nullable: true })
  usedAt!: Date | null;
}
