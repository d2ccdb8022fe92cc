import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** Who changed what about an account (role, disabled), kept for the admins. */
@Entity({ name: 'user_audit' })
export class UserAudit {
  @PrimaryGeneratedColumn({ type: 'int' })
  id: number;

  @Index()
  @Column({ name: 'user_id', type: 'int' })
  userId: number;

  @Column({ name: 'actor_id', type: 'int', nullable: true })
  actorId: number | null;

  @Column({ name: 'actor_name', type: 'varchar', length: 80 })
  actorName: string;

  @Column({ type: 'varchar', length: 40 })
  action: string;

  @Column({ name: 'from_value', type: 'varchar', length: 80, nullable: true })
  fromValue: string | null;

  @Column({ name: 'to_value', type: 'varchar', length: 80, nullable: true })
  toValue: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
