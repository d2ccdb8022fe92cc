import { Column, CreateDateColumn, Entity, OneToMany, PrimaryGeneratedColumn } from 'typeorm';
import type { VehicleModel } from './vehicle-model.entity';

@Entity({ name: 'makes' })
export class Make {
  @PrimaryGeneratedColumn({ type: 'int' })
  id: number;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  /** Lower-cased, whitespace-folded name: the natural key. */
  @Column({ name: 'name_key', type: 'varchar', length: 120, unique: true })
  nameKey: string;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @OneToMany('VehicleModel', 'make')
  models: VehicleModel[];
}
