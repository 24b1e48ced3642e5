import { Column, Entity, PrimaryColumn } from 'typeorm';
import type { ShopSettings } from '../../shared/schemas/options';

/** The shop's pricing and estimate settings: one row (id 1); absent means the shared defaults. */
@Entity('shop_settings')
export class ShopSettingsRow {
  @PrimaryColumn({ type: 'integer' }) id: number;
  @Column({ type: 'simple-json' }) settings: ShopSettings;
  @Column({ type: 'varchar', length: 30 }) updatedAt: string;
  @Column({ type: 'integer', nullable: true }) updatedBy: number | null;
}
