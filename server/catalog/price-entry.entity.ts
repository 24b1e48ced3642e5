import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** One distributor price for a model from a date on; a model has at most one price per distributor and date. */
@Entity('price_entries')
@Index(['normalizedModel', 'distributorId', 'effectiveFrom'], { unique: true })
@Index(['distributorId', 'importId'])
export class PriceEntry {
  @PrimaryGeneratedColumn({ type: 'integer' }) id: number;
  @Column({ type: 'integer' }) distributorId: number;
  @Column({ type: 'varchar', length: 80 }) model: string;
  @Column({ type: 'varchar', length: 80 }) normalizedModel: string;
  @Column({ type: 'integer' }) priceCents: number;
  @Column({ type: 'varchar', length: 3 }) currency: string;
  /** ISO date (YYYY-MM-DD): text compares in date order. */
  @Column({ type: 'varchar', length: 10 }) effectiveFrom: string;
  @Column({ type: 'varchar', length: 300, nullable: true }) description: string | null;
  @Column({ type: 'integer', nullable: true }) importId: number | null;
}
