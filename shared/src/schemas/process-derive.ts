import { z } from 'zod';

/** POST /api/processes/derive, the physics helper: process parameters from oxide thickness and doping. */

export const deriveProcessRequestSchema = z.strictObject({
  tox: z.number({ error: 'tox must be a number in m' }).min(1e-10, 'tox must be at least 0.1 nm (thinner than one atomic layer of oxide is not a gate oxide)').max(1e-6, 'tox must be at most 1 µm').describe('Oxide thickness, m'),
  substrateDoping: z
    .number({ error: 'substrateDoping must be a number in m⁻³' })
    .min(1e19, 'substrateDoping must be at least 1e19 m⁻³ (1e13 cm⁻³)')
    .max(1e27, 'substrateDoping must be at most 1e27 m⁻³ (1e21 cm⁻³)')
    .describe('Body doping NA (NMOS) or ND (PMOS) in m⁻³ — SI: 1e17 cm⁻³ is 1e23 m⁻³'),
  flatBand: z.number({ error: 'flatBand must be a number in V' }).min(-3).max(3).optional().describe('Flat-band voltage, V, polarity-normalised; VT0 is derived only when given'),
  mobility: z.number({ error: 'mobility must be a number in m²/(V·s)' }).gt(0).max(1).optional().describe('Channel mobility, m²/(V·s); kp = µ·Cox when given'),
  temperature: z.number({ error: 'temperature must be a number in °C' }).min(-200).max(300).default(27).describe('°C'),
});
export type DeriveProcessRequest = z.infer<typeof deriveProcessRequestSchema>;
export type DeriveProcessRequestInput = z.input<typeof deriveProcessRequestSchema>;

export const physicalConstantSchema = z.object({
  symbol: z.string(),
  name: z.string(),
  value: z.number(),
  unit: z.string(),
  source: z.string(),
});
export type PhysicalConstant = z.infer<typeof physicalConstantSchema>;

export const deriveProcessResponseSchema = z.object({
  cox: z.number().describe('F/m²'),
  gamma: z.number().describe('√V'),
  phiF: z.number().describe('V'),
  twoPhiF: z.number().describe('V'),
  n: z.number().describe('Slope factor at VSB = 0'),
  depletionWidth: z.number().describe('m, at 2φF'),
  ni: z.number().describe('m⁻³, at the temperature asked'),
  vt0: z.number().optional().describe('V, only when flatBand was given'),
  vtTc: z.number().optional().describe('V/K, only when flatBand was given'),
  kp: z.number().optional().describe('A/V², only when mobility was given'),
  temperature: z.number().describe('°C'),
  equations: z.array(z.string()),
  constants: z.array(physicalConstantSchema),
});
export type DeriveProcessResponse = z.infer<typeof deriveProcessResponseSchema>;
