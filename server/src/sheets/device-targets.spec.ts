import { deviceTargetsSchema } from '@channelwright/shared/schemas';
import { DomainError } from '../common/errors/domain-error.js';
import { constraintOf, mergeTargets, sizeRequestOf } from './device-targets.js';

const stored = deviceTargetsSchema.parse({ name: 'M1', polarity: 'nmos', id: 20e-6, l: 0.5e-6, vds: 0.6, vov: 0.2, corner: 'FF', matchGroup: 'pair', multiplier: 2 });

describe('device targets', () => {
  it('replaces the stored constraint with the one a patch gives and keeps every other target', () => {
    const merged = mergeTargets(stored, { version: 1, gmId: 12 });
    expect(merged).toEqual({ ...stored, vov: undefined, gmId: 12 });
    expect(merged).not.toHaveProperty('vov');
    expect(constraintOf(merged)).toBe('gmId');
  });

  it('clears an optional target given as null, back to the sheet default', () => {
    const merged = mergeTargets(stored, { version: 1, corner: null, matchGroup: null });
    expect(merged).not.toHaveProperty('corner');
    expect(merged).not.toHaveProperty('matchGroup');
    expect(sizeRequestOf(merged, { corner: 'SS', temperature: 85, model: 'square-law' }, { profileId: 'p', version: 3 })).toMatchObject({ corner: 'SS', temperature: 85, model: 'square-law', processId: 'p', processVersion: 3 });
  });

  it('refuses a merge that leaves the targets invalid with a 400 naming the field', () => {
    const attempt = () => mergeTargets(stored, { version: 1, multiplier: 0 } as never);
    expect(attempt).toThrow(DomainError);
    try {
      attempt();
    } catch (error) {
      expect(error).toMatchObject({ status: 400, code: 'VALIDATION_FAILED', field: 'multiplier' });
    }
  });

  it('sends the device\'s own corner, temperature and model before the sheet\'s', () => {
    const request = sizeRequestOf({ ...stored, temperature: -40, model: 'all-region' }, { corner: 'SS', temperature: 85, model: 'square-law' }, { profileId: 'p', version: 1 });
    expect(request).toMatchObject({ corner: 'FF', temperature: -40, model: 'all-region', vov: 0.2, id: 20e-6 });
    expect(request).not.toHaveProperty('gmId');
  });
});
