import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import type { DecimalConvention, DecimalSource, ImportRowError, ImportStatus } from '../../shared/schemas/imports';

export type { ImportRowError, ImportStatus };

/** One upload: its counts, row errors and, while a preview, the valid rows waiting for commit. */
@Entity('imports')
export class ImportRecord {
  @PrimaryGeneratedColumn({ type: 'integer' }) id: number;
  @Column({ type: 'varchar', length: 24 }) kind: string;
  @Column({ type: 'varchar', length: 255 }) fileName: string;
  @Column({ type: 'integer', nullable: true }) distributorId: number | null;
  @Column({ type: 'integer', nullable: true }) uploadedById: number | null;
  @Column({ type: 'varchar', length: 16 }) status: ImportStatus;
  @Column({ type: 'integer', default: 0 }) rows: number;
  @Column({ type: 'integer', default: 0 }) inserted: number;
  @Column({ type: 'integer', default: 0 }) updated: number;
  @Column({ type: 'integer', default: 0 }) unchanged: number;
  @Column({ type: 'integer', default: 0 }) rejected: number;
  @Column({ type: 'integer', default: 0 }) unmatched: number;
  /** The first MAX_STORED_ERRORS row errors; errorsTotal counts them all. */
  @Column({ type: 'simple-json' }) errors: ImportRowError[];
  @Column({ type: 'integer', default: 0 }) errorsTotal: number;
  @Column({ type: 'varchar', length: 8, nullable: true }) decimalConvention: DecimalConvention | null;
  @Column({ type: 'varchar', length: 8, nullable: true }) decimalSource: DecimalSource | null;
  /** The preview's valid rows as JSON (cleared on commit). */
  @Column({ type: 'text', nullable: true }) payload: string | null;
  @CreateDateColumn({ type: Date }) createdAt: Date;
  @Column({ type: Date, nullable: true }) committedAt: Date | null;
  @Column({ type: Date, nullable: true }) revertedAt: Date | null;
}
