import type { EntityManager } from '@mikro-orm/postgresql';
import type { ReactionSetDetail } from '@tallus/contracts';
import { MassBalanceModel } from '../mass-balance/mass-balance-model.entity';
import { MASS_BALANCE_ASSUMPTIONS } from '../mass-balance/water-for-solver';
import { toModelView } from '../mass-balance/to-model-view';
import { ReactionSet } from '../reaction-sets/reaction-set.entity';
import { getReactionSet } from '../reaction-sets/get-reaction-set';
import { listRockSamples } from '../rock-samples/list-rock-samples';
import { loadTeamSettings } from '../team-settings/load-team-settings';
import { Team } from '../teams/team.entity';
import { listWaterAnalyses } from '../water-analyses/list-water-analyses';
import type { PdfContent, PdfDocument } from './pdf-document';
import { reactionSetSection } from './reaction-sections';
import { REPORT_ASSUMPTIONS, REPORT_CAUTIONS, REPORT_REFERENCES } from './report-texts';
import { abaSection, co2Section, massBalanceSection, waterSection } from './site-sections';

const STYLES: PdfDocument['styles'] = {
  h1: { fontSize: 18, bold: true, color: '#1f2a33', margin: [0, 0, 0, 4] },
  h2: { fontSize: 13, bold: true, color: '#1f2a33', margin: [0, 10, 0, 2] },
  h3: { fontSize: 10.5, bold: true, color: '#8a4b1c', margin: [0, 8, 0, 3] },
  th: { bold: true, fontSize: 7.5, color: '#1f2a33' },
  table: { fontSize: 7.5 },
  equation: { fontSize: 7.5 },
  small: { fontSize: 7.5, color: '#3d4852' },
  caption: { fontSize: 9, bold: true },
  caution: { fontSize: 8.5, color: '#7a2e1d' },
};

function frame(title: string, subtitle: string, body: PdfContent[], generatedAt: Date): PdfDocument {
  return {
    info: { title, author: 'Tallus', subject: 'Screening estimate' },
    pageSize: 'A4',
    pageOrientation: 'landscape',
    pageMargins: [36, 36, 36, 40],
    defaultStyle: { font: 'Roboto', fontSize: 9, color: '#1f2a33' },
    styles: STYLES,
    footer: (page, count) => ({ text: `${title} · generated ${generatedAt.toISOString().slice(0, 16).replace('T', ' ')} UTC · screening estimate · page ${page} of ${count}`, style: 'small', margin: [36, 12, 36, 0] }),
    content: [
      { text: title, style: 'h1' },
      { text: subtitle, style: 'small' },
      { text: 'Cautions', style: 'h2' },
      { ul: [...REPORT_CAUTIONS], style: 'caution' },
      ...body,
      { text: 'Assumptions', style: 'h2', pageBreak: 'before' },
      { ul: [...REPORT_ASSUMPTIONS, ...MASS_BALANCE_ASSUMPTIONS] },
      { text: 'References', style: 'h2' },
      { ul: [...REPORT_REFERENCES], style: 'small' },
    ],
  };
}

/** The report of one reaction set: its reactions with checks and budgets, net reactions, review state and revision. */
export async function buildSetReport(em: EntityManager, setId: string, now = new Date()): Promise<{ document: PdfDocument; fileBase: string }> {
  const set = await getReactionSet(em, setId);
  const team = await em.findOneOrFail(Team, set.teamId);
  const document = frame(`Reaction set report: ${set.name}`, `Team ${team.name}. Every figure below was recomputed by the server when the reaction was saved.`, reactionSetSection(set), now);
  return { document, fileBase: `${set.name}-report` };
}

/**
 * The report of a site (records whose `site` equals it; '' for the whole team):
 * reaction sets, water analyses, mass-balance models, ABA table and plot, CO2 figures.
 */
export async function buildSiteReport(em: EntityManager, teamId: string, site: string, now = new Date()): Promise<{ document: PdfDocument; fileBase: string }> {
  const team = await em.findOneOrFail(Team, teamId);
  const filter = site === '' ? undefined : site;
  const settings = await loadTeamSettings(em, teamId);
  const setRows = await em.find(ReactionSet, { team: teamId, ...(filter === undefined ? {} : { site: filter }) }, { orderBy: { name: 'asc' }, fields: ['id'] });
  const sets: ReactionSetDetail[] = [];
  for (const row of setRows) sets.push(await getReactionSet(em, row.id));
  const waters = await listWaterAnalyses(em, teamId, filter, settings);
  const waterIds = new Set(waters.map((water) => water.id));
  const models = (await em.find(MassBalanceModel, { team: teamId }, { orderBy: { name: 'asc' } })).map(toModelView).filter((model) => filter === undefined || waterIds.has(model.finalWaterId));
  const samples = await listRockSamples(em, teamId, filter, settings);
  const body: PdfContent[] = [
    { text: 'Reaction sets', style: 'h2' },
    ...(sets.length === 0 ? [{ text: 'No reaction sets for this site.', style: 'small' }] : sets.flatMap((set) => reactionSetSection(set))),
    { text: 'Water analyses', style: 'h2', pageBreak: 'before' },
    ...waterSection(waters, settings),
    { text: 'Inverse mass balance', style: 'h2' },
    ...massBalanceSection(models),
    { text: 'Acid-base accounting', style: 'h2', pageBreak: 'before' },
    ...abaSection(samples, settings),
    { text: 'CO2 uptake potential', style: 'h2' },
    ...co2Section(samples),
  ];
  const title = `Site report: ${site === '' ? team.name : site}`;
  return { document: frame(title, `Team ${team.name}; ${sets.length} reaction set(s), ${waters.length} water analyses, ${models.length} mass-balance model(s), ${samples.length} rock samples.`, body, now), fileBase: `${site || team.name}-site-report` };
}
