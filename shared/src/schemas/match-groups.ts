import { z } from 'zod';
import { CONSTRAINTS, quantity } from './request-fields.js';
import { label } from './text-fields.js';

/**
 * POST /api/sheets/:id/match-groups/resize: the area that brings a match group's worst pair to a target
 * input-referred offset σ(VOS) (Pelgrom, Duinmaijer & Welbers 1989; Kinget 2005), and the re-sized devices:
 * every member's W and L scaled together at the same gm/ID (or VOV), so their ratios (a 4:1 mirror) stay.
 * apply: false shows the plan and writes nothing; apply: true writes it in one transaction, 409 STALE_EDIT
 * when a member changed since the versions given (those of the preview).
 */
export const matchGroupResizeRequestSchema = z
  .strictObject({
    group: label('group', 50),
    sigmaVos: quantity('sigmaVos', 'V', { gt: 0, max: 1 }).optional().describe('Target σ(VOS), V; the group\'s budget on the sheet when absent'),
    apply: z.boolean({ error: 'apply must be true or false' }).default(false),
    versions: z.record(z.string(), z.number().int().positive()).optional().describe('apply: the version of each member the preview showed'),
  })
  .superRefine((value, ctx) => {
    if (value.apply && value.versions === undefined) ctx.addIssue({ code: 'custom', path: ['versions'], message: 'apply needs the versions of the preview' });
  });
export type MatchGroupResizeRequest = z.infer<typeof matchGroupResizeRequestSchema>;
export type MatchGroupResizeRequestInput = z.input<typeof matchGroupResizeRequestSchema>;

const offsetFiguresSchema = z.object({
  sigmaVos: z.number().describe('σ(VOS) of the worst pair, V'),
  sigmaVt: z.number().describe('σ(ΔVT) of that pair, V'),
  sigmaBeta: z.number().describe('σ(Δβ/β) of that pair'),
  area: z.number().describe('Σ W·L·multiplier of the group, m²'),
});

const memberSizeSchema = z.object({ w: z.number(), l: z.number(), gmId: z.number(), vov: z.number(), fingers: z.number().int() });

export const matchGroupResizeSchema = z.object({
  group: z.string(),
  target: z.number().describe('σ(VOS) aimed at, V'),
  keep: z.enum(['gmId', 'vov']).describe('What each member keeps while its area changes'),
  scale: z.number().describe('Factor on every member\'s L (and so, at the same gm/ID, on its W)'),
  requiredArea: z.number().describe('W·L per device of an equal pair at the group\'s gm/ID that meets the target (Kinget 2005), m²'),
  before: offsetFiguresSchema,
  after: offsetFiguresSchema,
  meetsTarget: z.boolean(),
  limitedBy: z.string().nullable().describe('Why the target was not reached (L at lmin, W at its maximum …), or null'),
  members: z.array(
    z.object({
      deviceId: z.string(),
      name: z.string(),
      version: z.number().int(),
      constraint: z.enum(CONSTRAINTS).describe('The member\'s constraint before; w and vgs members are re-sized at their gm/ID'),
      from: memberSizeSchema,
      to: memberSizeSchema,
    }),
  ),
  applied: z.boolean(),
});
export type MatchGroupResize = z.infer<typeof matchGroupResizeSchema>;
