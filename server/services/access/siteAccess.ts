import type { DataSource } from 'typeorm';
import { Site } from '../../db/entities/Site.js';
import { SiteMember } from '../../db/entities/SiteMember.js';
import { User } from '../../db/entities/User.js';
import { NotFoundError, ValidationError } from '../../errors.js';
import { audit } from '../audit/audit.js';
import type { SiteRecord } from '../../../shared/types/api.js';

export async function listSitesWithMembers(ds: DataSource): Promise<SiteRecord[]> {
  const sites = await ds.getRepository(Site).find({ order: { name: 'ASC' } });
  const members = await ds.getRepository(SiteMember).find();
  return sites.map((s) => ({
    id: s.id,
    name: s.name,
    location: s.location,
    memberIds: members.filter((m) => m.siteId === s.id).map((m) => m.userId),
  }));
}

/** Replace the set of sites a user may see, in one transaction. */
export async function setUserSites(ds: DataSource, actorId: string, userId: string, siteIds: string[]): Promise<string[]> {
  return ds.transaction(async (em) => {
    if (!(await em.findOneBy(User, { id: userId }))) throw new NotFoundError('User');
    const known = siteIds.length ? await em.getRepository(Site).findBy(siteIds.map((id) => ({ id }))) : [];
    const unknown = siteIds.filter((id) => !known.some((s) => s.id === id));
    if (unknown.length)
      throw new ValidationError(
        'Unknown site',
        unknown.map((id) => ({ path: 'siteIds', message: `site ${id} does not exist` })),
      );
    await em.delete(SiteMember, { userId });
    for (const siteId of new Set(siteIds)) await em.insert(SiteMember, { siteId, userId });
    await audit(em, actorId, 'update', 'user-sites', userId, { siteIds });
    return [...new Set(siteIds)];
  });
}
