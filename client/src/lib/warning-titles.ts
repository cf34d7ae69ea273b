import type { WarningCode } from '@channelwright/shared/schemas';

/** A short plain title per caution; the engine's sentence under it says why and what to do. */
export const WARNING_TITLES: Record<WarningCode, string> = {
  SQUARE_LAW_NEAR_THRESHOLD: 'The square law is out of its depth this close to threshold',
  L_NEAR_LMIN: 'L is close to the minimum: short-channel effects are not modelled',
  VDS_BELOW_VDSSAT: 'VDS is below VDSsat: the device is not saturated',
  SOURCE_BODY_FORWARD_BIASED: 'The source–body junction is forward-biased',
  GM_ID_NEAR_WEAK_INVERSION_LIMIT: 'gm/ID is near its weak-inversion limit',
  DEPLETION_CONDUCTS_AT_VGS0: 'Depletion-mode device: it conducts at VGS = 0',
  W_BELOW_WMIN: 'W is below the process minimum',
  VGS_ABOVE_VDD: 'VGS is above the supply',
  VDS_ABOVE_VDD: 'VDS is above the supply',
  TEMPERATURE_OUTSIDE_PROCESS_RANGE: 'The temperature is outside the process range',
  POINTS_WITHOUT_ANSWER: 'Some points have no answer',
  TEMPERATURE_INTERPOLATED: 'Temperature between characterised ones',
  AREA_IMPLAUSIBLE: 'The device is implausibly large',
  FINGERS_IMPLAUSIBLE: 'Implausibly many fingers',
  CURRENT_DENSITY_IMPLAUSIBLE: 'More current per width than silicon carries',
};
