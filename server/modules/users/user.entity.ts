import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { ROLES, type Role } from '@/lib/contracts/enums';

@Entity({ name: 'users' })
export class User {
  @PrimaryGeneratedColumn({ type: 'int' })
  id: number;

  /** As signed up: normalizeEmail (lib/contracts/auth.ts) form; older rows may keep capitals. email_key is unique. */
  @Column({ type: 'varchar', length: 254 })
  email: string;

  @Column({ name: 'email_key', type: 'varchar', length: 254, unique: true })
  emailKey: string;

  @Column({ name: 'display_name', type: 'varchar', length: 80 })
  displayName: string;

  @Column({ name: 'password_hash', type: 'varchar', length: 100 })
  passwordHash: string;

  @Column({ type: 'enum', enum: ROLES, default: 'contributor' })
  role: Role;

  @Column({ name: 'email_verified_at', type: 'datetime', precision: 3, nullable: true })
  emailVerifiedAt: Date | null;

  @Column({ name: 'disabled_at', type: 'datetime', precision: 3, nullable: true })
  disabledAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
