import { Column, Entity, PrimaryColumn } from 'typeorm';
import type { RuleSettings } from '../../shared/rules/types';

/** The shop's rule settings: one row (id 1) holding the admin's values; absent means the shared defaults. */
@Entity('rule_settings')
export class RuleSettingsRow {
  @PrimaryColumn({ type: 'integer' }) id: number;
  @Column({ type: 'simple-json' }) settings: RuleSettings;
  @Column({ type: 'varchar', length: 30 }) updatedAt: string;
  @Column({ type: 'integer', nullable: true }) updatedBy: number | null;
}
