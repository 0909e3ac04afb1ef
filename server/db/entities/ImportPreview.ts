import { Column, Entity, PrimaryColumn } from 'typeorm';

/**
 * A previewed import waiting to be committed by its token (the id): the rows as read, gzip-compressed JSON
 * `{ headers, rows }`, for one user and column until `expiresAt`.
 */
@Entity({ name: 'import_previews' })
export class ImportPreviewEntity {
  @PrimaryColumn({ type: 'uuid' }) id: string;
  @Column({ type: 'uuid', name: 'user_id' }) userId: string;
  @Column({ type: 'uuid', name: 'column_id' }) columnId: string;
  @Column({ type: 'text', name: 'file_name' }) fileName: string;
  @Column({ type: 'integer', name: 'first_data_row' }) firstDataRow: number;
  @Column({ type: 'bytea', name: 'table_data' }) tableData: Buffer;
  @Column({ type: 'timestamptz', name: 'created_at', default: () => 'now()' }) createdAt: Date;
  @Column({ type: 'timestamptz', name: 'expires_at' }) expiresAt: Date;
}
