import { Column, Entity, PrimaryColumn } from 'typeorm';

/** Grants a user sight of every column on a site. Admins see every site. */
@Entity({ name: 'site_members' })
export class SiteMember {
  @PrimaryColumn({ type: 'uuid', name: 'site_id' }) siteId: string;
  @PrimaryColumn({ type: 'uuid', name: 'user_id' }) userId: string;
  @Column({ type: 'timestamptz', name: 'granted_at', default: () => 'now()' }) grantedAt: Date;
}
