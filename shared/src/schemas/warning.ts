import { z } from 'zod';

/** Codes of the cautions the engine attaches to a result; each comes with a plain sentence. */
export const WARNING_CODES = [
  'SQUARE_LAW_NEAR_THRESHOLD',
  'L_NEAR_LMIN',
  'VDS_BELOW_VDSSAT',
  'SOURCE_BODY_FORWARD_BIASED',
  'GM_ID_NEAR_WEAK_INVERSION_LIMIT',
  'DEPLETION_CONDUCTS_AT_VGS0',
  'W_BELOW_WMIN',
  'VGS_ABOVE_VDD',
  'VDS_ABOVE_VDD',
  'TEMPERATURE_OUTSIDE_PROCESS_RANGE',
  'POINTS_WITHOUT_ANSWER',
  'TEMPERATURE_INTERPOLATED',
  'AREA_IMPLAUSIBLE',
  'FINGERS_IMPLAUSIBLE',
  'CURRENT_DENSITY_IMPLAUSIBLE',
] as const;
export type WarningCode = (typeof WARNING_CODES)[number];

export const warningSchema = z.object({
  code: z.enum(WARNING_CODES),
  message: z.string(),
});
export type Warning = z.infer<typeof warningSchema>;
