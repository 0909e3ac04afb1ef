import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** A photo of a finding; original and thumbnail live in S3 (server/storage/photos.ts). */
@Entity({ name: 'inspection_photos' })
export class InspectionPhoto {
  @PrimaryGeneratedColumn('uuid') id: string;
  @Column({ type: 'uuid', name: 'inspection_id' }) inspectionId: string;
  @Column({ type: 'integer', nullable: true }) tray: number | null;
  @Column({ type: 'integer', nullable: true }) pass: number | null;
  @Column({ type: 'text', default: '' }) finding: string;
  @Column({ type: 'text', default: '' }) caption: string;
  @Column({ type: 'text', name: 'content_type' }) contentType: string;
  @Column({ type: 'integer' }) bytes: number;
  @Column({ type: 'integer', nullable: true }) width: number | null;
  @Column({ type: 'integer', nullable: true }) height: number | null;
  @Column({ type: 'text', name: 'object_key' }) objectKey: string;
  @Column({ type: 'text', name: 'thumb_key' }) thumbKey: string;
  @Column({ type: 'uuid', name: 'uploaded_by', nullable: true }) uploadedBy: string | null;
  @Column({ type: 'timestamptz', name: 'uploaded_at', default: () => 'now()' }) uploadedAt: Date;
}
