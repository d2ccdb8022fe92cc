import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
  VersionColumn,
} from 'typeorm';
import type { ColumnOptions } from 'typeorm';
import { QUANTITY_KINDS, type QuantityKind } from '@/lib/contracts/enums';
import { COLUMN_FIELDS, type SpecValues } from '@/lib/contracts/spec-fields';
import type { Component } from '../library/component.entity';
import type { Source } from '../library/source.entity';

/**
 * A spec's value columns (parameter … status) come from the one field list: the class
 * declares the keys, ids and bookkeeping, and the loop below the class gives each listed
 * field its column (type from the field's kind and rule). `SpecValues` types them.
 */
// eslint-disable-next-line @typescript-eslint/no-unsafe-declaration-merging, @typescript-eslint/no-empty-object-type -- the columns below are typed by SpecValues
export interface Spec extends Omit<SpecValues, 'sourceId'> {}

@Entity({ name: 'specs' })
@Index('uq_specs_component_parameter', ['componentId', 'parameterKey'], { unique: true })
// eslint-disable-next-line @typescript-eslint/no-unsafe-declaration-merging -- see the interface above
export class Spec {
  @PrimaryGeneratedColumn({ type: 'int' })
  id: number;

  @Column({ name: 'component_id', type: 'int' })
  componentId: number;

  @ManyToOne('Component', 'specs', { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'component_id' })
  component: Component;

  @Column({ name: 'parameter_key', type: 'varchar', length: 120 })
  parameterKey: string;

  @Column({ name: 'quantity_kind', type: 'enum', enum: QUANTITY_KINDS })
  quantityKind: QuantityKind;

  @Index()
  @Column({ name: 'source_id', type: 'int', nullable: true })
  sourceId: number | null;

  @ManyToOne('Source', { onDelete: 'RESTRICT', nullable: true })
  @JoinColumn({ name: 'source_id' })
  source: Source | null;

  /** Optimistic lock: every write states the version it was based on. */
  @VersionColumn({ type: 'int' })
  version: number;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}

/** The column a listed field is stored in: its SQL type from the field's kind and rule. */
export function specColumnOptions(f: (typeof COLUMN_FIELDS)[number]): ColumnOptions {
  const base = { name: f.column, nullable: f.nullable };
  const values = f.rule.values ?? [];
  switch (f.kind) {
    case 'number':
      return { ...base, type: 'double' };
    case 'unit':
      return { ...base, type: 'varchar', length: 8 };
    case 'enum':
      return { ...base, type: 'enum', enum: [...values], ...(f.dbDefault ? { default: f.dbDefault } : {}) };
    case 'text':
      return f.rule.multiline ? { ...base, type: 'text' } : { ...base, type: 'varchar', length: f.rule.maxLength };
  }
}

for (const f of COLUMN_FIELDS) Column(specColumnOptions(f))(Spec.prototype, f.key);
