import { z } from 'zod';

/**
 * PDF reports (issue 7), rendered server-side with pdfmake and the Roboto
 * fonts shipped in its npm package:
 * `GET /api/reaction-sets/:id/report.pdf` (viewer+): the set's reactions with their
 * checks and budgets, net reactions, review state and revision, assumptions,
 * references and cautions;
 * `GET /api/teams/:teamId/site-report.pdf?site=<site>` (viewer+): a site's
 * reaction sets, water analyses with charge balance, mass-balance models, ABA
 * table and NP-vs-AP plot, CO2 figures, assumptions, references and cautions.
 * Answers `application/pdf` with a `Content-Disposition: attachment` file name.
 */

/** Query of `GET /api/teams/:teamId/site-report.pdf`: the site (exact match of the records' `site`); empty: every record of the team. */
export const siteReportQuerySchema = z.object({
  site: z.string().max(200).default(''),
});
export type SiteReportQuery = z.infer<typeof siteReportQuerySchema>;

/** Query of `GET /api/teams/:teamId/sites` (viewer+): none. Answer: the distinct sites of the team's sets, waters and rock samples. */
export const siteListResponseSchema = z.array(
  z.object({
    site: z.string(),
    reactionSets: z.number().int().nonnegative(),
    waterAnalyses: z.number().int().nonnegative(),
    rockSamples: z.number().int().nonnegative(),
  }),
);
export type SiteListResponse = z.infer<typeof siteListResponseSchema>;
