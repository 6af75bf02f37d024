import type { EntityManager } from '@mikro-orm/postgresql';
import type { SiteListResponse } from '@tallus/contracts';

/** The distinct non-empty sites of a team's reaction sets, water analyses and rock samples, with counts. */
export async function listSites(em: EntityManager, teamId: string): Promise<SiteListResponse> {
  const rows = await em.execute<Array<{ site: string; kind: string; count: string }>>(
    `select site, 'set' as kind, count(*) as count from reaction_sets where team_id = ? and site <> '' group by site
     union all select site, 'water', count(*) from water_analyses where team_id = ? and site <> '' group by site
     union all select site, 'rock', count(*) from rock_samples where team_id = ? and site <> '' group by site`,
    [teamId, teamId, teamId],
  );
  const sites = new Map<string, SiteListResponse[number]>();
  for (const row of rows) {
    const entry = sites.get(row.site) ?? { site: row.site, reactionSets: 0, waterAnalyses: 0, rockSamples: 0 };
    if (row.kind === 'set') entry.reactionSets = Number(row.count);
    if (row.kind === 'water') entry.waterAnalyses = Number(row.count);
    if (row.kind === 'rock') entry.rockSamples = Number(row.count);
    sites.set(row.site, entry);
  }
  return [...sites.values()].sort((a, b) => a.site.localeCompare(b.site));
}
