import type { Process, SizeRequestInput, SizeResponse, SweepRequestInput, SweepSpec } from '@channelwright/shared/schemas';

/** Which corners and temperatures the charts draw, one series each. */
export interface SeriesChoice {
  corners: string[];
  temperatures: number[];
}

/** What bounds the sweeps of a process: its supply, nominal temperature and temperature range. */
export interface ProcessSpan {
  vdd: number;
  tnom: number;
  tempRange?: { min: number; max: number };
}

export const processSpanOf = (process: Process): ProcessSpan => ({ vdd: process.vdd, tnom: process.tnom, tempRange: process.tempRange });

type Device = Omit<SizeRequestInput, 'vov' | 'gmId' | 'w' | 'vgs'>;

/** The device of a size request without its second constraint. */
function deviceOf(request: SizeRequestInput): Device {
  const { vov: _vov, gmId: _gmId, w: _w, vgs: _vgs, ...device } = request;
  return device;
}

const sweep = (param: SweepSpec['param'], from: number, to: number, points: number): SweepRequestInput['sweep'] => ({ param, from, to, points, scale: 'lin' });

function withSeries(choice: SeriesChoice) {
  return { corners: choice.corners, temperatures: choice.temperatures };
}

/**
 * W/L, gm/ID, fT and intrinsic gain against VOV at the target current: the device re-sized at each
 * overdrive (hold ID), from weak inversion to well into strong inversion.
 */
export function overdriveSweep(request: SizeRequestInput, result: SizeResponse, span: ProcessSpan, choice: SeriesChoice): SweepRequestInput {
  const to = Math.min(Math.max(0.6, result.vov + 0.25), span.vdd - Math.max(result.vt, 0));
  return {
    ...request,
    sweep: sweep('vov', -0.15, Math.max(to, 0.2), 151),
    hold: 'id',
    fields: ['wOverL', 'gmId', 'ft', 'intrinsicGain'],
    ...withSeries(choice),
  };
}

/** ID against VGS at the sized width (hold W), 0 … VDD, with the current model given. */
export function transferSweep(request: SizeRequestInput, result: SizeResponse, span: ProcessSpan, choice: SeriesChoice, model: SizeRequestInput['model']): SweepRequestInput {
  return {
    ...deviceOf(request),
    model,
    w: result.w,
    sweep: sweep('vgs', 0, span.vdd, 181),
    hold: 'w',
    fields: ['id'],
    ...withSeries(choice),
  };
}

const rangeOf = (span: ProcessSpan) => span.tempRange ?? { min: -40, max: 125 };

/** ID and the off current against temperature at the sized width and VGS (hold W), over the process range. */
export function temperatureSweep(request: SizeRequestInput, span: ProcessSpan, choice: SeriesChoice): SweepRequestInput {
  const range = rangeOf(span);
  return {
    ...request,
    sweep: sweep('temperature', range.min, range.max, 84),
    hold: 'w',
    fields: ['id', 'ioff'],
    corners: choice.corners,
  };
}

/** ID against VGS at the coldest, nominal and hottest temperature: the curves cross at the zero-TC point. */
export function ztcSweep(request: SizeRequestInput, result: SizeResponse, span: ProcessSpan): SweepRequestInput {
  const range = rangeOf(span);
  const temperatures = [...new Set([range.min, span.tnom, range.max])];
  return {
    ...deviceOf(request),
    w: result.w,
    sweep: sweep('vgs', Math.max(0, result.vt - 0.1), span.vdd, 141),
    hold: 'w',
    fields: ['id'],
    temperatures,
  };
}

/** VT against VSB from 0 to VDD: the body effect at the sized device. */
export function bodyEffectSweep(request: SizeRequestInput, span: ProcessSpan, choice: SeriesChoice): SweepRequestInput {
  return {
    ...request,
    sweep: sweep('vsb', 0, span.vdd, 91),
    hold: 'w',
    fields: ['vt'],
    ...withSeries(choice),
  };
}
