import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** An indoor (evaporator) coil; columns are IndoorCoilSpec's fields (DESIGN.md §2). */
@Entity('indoor_coils')
export class IndoorCoil {
  @PrimaryGeneratedColumn({ type: 'integer' }) id: number;
  @Column({ type: 'varchar', length: 80 }) model: string;
  @Index({ unique: true }) @Column({ type: 'varchar', length: 80 }) normalizedModel: string;
  @Column({ type: 'varchar', length: 80, nullable: true }) brand: string | null;
  @Column({ type: 'varchar', length: 300, nullable: true }) description: string | null;
  @Column({ type: 'varchar', length: 16, nullable: true }) configuration: string | null;
  @Column({ type: 'boolean', nullable: true }) cased: boolean | null;
  @Column({ type: 'varchar', length: 16, nullable: true }) material: string | null;
  @Column({ type: 'double precision' }) minTons: number;
  @Column({ type: 'double precision' }) maxTons: number;
  @Column({ type: 'simple-json' }) refrigerants: string[];
  @Column({ type: 'varchar', length: 16 }) meteringType: string;
  @Column({ type: 'varchar', length: 16, nullable: true }) meteringRefrigerant: string | null;
  @Column({ type: 'boolean', nullable: true }) meteringBidirectional: boolean | null;
  @Column({ type: 'boolean', nullable: true }) meteringBleed: boolean | null;
  @Column({ type: 'double precision', nullable: true }) pistonSizeIn: number | null;
  @Column({ type: 'boolean', nullable: true }) a2lListed: boolean | null;
  @Column({ type: 'boolean', nullable: true }) leakSensor: boolean | null;
  @Column({ type: 'double precision', nullable: true }) widthIn: number | null;
  @Column({ type: 'double precision', nullable: true }) liquidConnOdIn: number | null;
  @Column({ type: 'double precision', nullable: true }) suctionConnOdIn: number | null;
  @Column({ type: 'varchar', length: 10, nullable: true }) manufactureDate: string | null;
  @Index() @Column({ type: 'integer', nullable: true }) importId: number | null;
}
