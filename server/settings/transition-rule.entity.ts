import { Column, Entity, PrimaryColumn } from 'typeorm';

/** A refrigerant transition rule as admin-editable data (seeded from shared/regulation's defaults). */
@Entity('transition_rules')
export class TransitionRuleRow {
  @PrimaryColumn({ type: 'varchar', length: 64 }) id: string;
  /** Order the office keeps them in. */
  @Column({ type: 'integer' }) position: number;
  @Column({ type: 'simple-json' }) refrigerants: string[];
  @Column({ type: 'varchar', length: 32 }) scope: 'new-system' | 'component-replacement' | 'any';
  @Column({ type: 'varchar', length: 10 }) installFrom: string;
  @Column({ type: 'varchar', length: 10, nullable: true }) manufacturedBefore: string | null;
  @Column({ type: 'varchar', length: 16 }) severity: 'blocker' | 'caution';
  @Column({ type: 'varchar', length: 300 }) citation: string;
  @Column({ type: 'text' }) note: string;
}
