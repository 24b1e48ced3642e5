import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** A stored file (nameplate or install photo): found through the storage interface by an opaque key. */
@Entity('attachments')
export class AttachmentRow {
  @PrimaryGeneratedColumn({ type: 'integer' }) id: number;
  @Index() @Column({ type: 'integer' }) jobId: number;
  @Index() @Column({ type: 'integer', nullable: true }) systemId: number | null;
  @Column({ type: 'varchar', length: 16 }) kind: string;
  /** The name the phone sent, cleaned, for display only: never a path. */
  @Column({ type: 'varchar', length: 120 }) fileName: string;
  @Column({ type: 'varchar', length: 40 }) contentType: string;
  @Column({ type: 'integer' }) sizeBytes: number;
  @Column({ type: 'varchar', length: 64 }) sha256: string;
  @Column({ type: 'varchar', length: 64 }) storageKey: string;
  @Column({ type: 'integer', nullable: true }) uploadedBy: number | null;
  @Column({ type: 'varchar', length: 30 }) createdAt: string;
}
