import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** An outdoor unit (condensing unit or heat pump); columns are OutdoorUnitSpec's fields (DESIGN.md §2). */
@Entity('outdoor_units')
export class OutdoorUnit {
  @PrimaryGeneratedColumn({ type: 'integer' }) id: number;
  @Column({ type: 'varchar', length: 80 }) model: string;
  @Index({ unique: true }) @Column({ type: 'varchar', length: 80 }) normalizedModel: string;
  @Column({ type: 'varchar', length: 80, nullable: true }) brand: string | null;
  @Column({ type: 'varchar', length: 300, nullable: true }) description: string | null;
  @Column({ type: 'varchar', length: 16 }) systemType: string;
  @Column({ type: 'varchar', length: 16 }) refrigerant: string;
  @Column({ type: 'double precision' }) nominalTons: number;
  @Column({ type: 'double precision', nullable: true }) coolingBtuh: number | null;
  @Column({ type: 'double precision', nullable: true }) seer2: number | null;
  @Column({ type: 'double precision', nullable: true }) eer2: number | null;
  @Column({ type: 'double precision', nullable: true }) hspf2: number | null;
  @Column({ type: 'varchar', length: 16, nullable: true }) meteringRequired: string | null;
  @Column({ type: 'double precision', nullable: true }) pistonSizeIn: number | null;
  @Column({ type: 'double precision', nullable: true }) liquidLineOdIn: number | null;
  @Column({ type: 'double precision', nullable: true }) suctionLineOdIn: number | null;
  @Column({ type: 'simple-json', nullable: true }) allowedLiquidOdIn: number[] | null;
  @Column({ type: 'simple-json', nullable: true }) allowedSuctionOdIn: number[] | null;
  @Column({ type: 'double precision', nullable: true }) maxLineLengthFt: number | null;
  @Column({ type: 'double precision', nullable: true }) maxLiftFt: number | null;
  @Column({ type: 'double precision', nullable: true }) maxLiftOutdoorAboveFt: number | null;
  @Column({ type: 'double precision', nullable: true }) maxLiftOutdoorBelowFt: number | null;
  @Column({ type: 'double precision', nullable: true }) standardLineLengthFt: number | null;
  @Column({ type: 'double precision', nullable: true }) factoryChargeOz: number | null;
  @Column({ type: 'double precision', nullable: true }) chargedLineLengthFt: number | null;
  @Column({ type: 'double precision', nullable: true }) chargePerFtOz: number | null;
  @Column({ type: 'double precision', nullable: true }) mcaAmps: number | null;
  @Column({ type: 'double precision', nullable: true }) mocpAmps: number | null;
  @Column({ type: 'varchar', length: 16, nullable: true }) voltage: string | null;
  @Column({ type: 'boolean', nullable: true }) copperOnly: boolean | null;
  @Column({ type: 'varchar', length: 16, nullable: true }) overcurrentRequired: string | null;
  @Column({ type: 'integer', nullable: true }) phase: number | null;
  @Column({ type: 'boolean', nullable: true }) startAssist: boolean | null;
  @Column({ type: 'varchar', length: 10, nullable: true }) manufactureDate: string | null;
  @Column({ type: 'double precision', nullable: true }) targetSubcoolingF: number | null;
  @Index() @Column({ type: 'integer', nullable: true }) importId: number | null;
}
