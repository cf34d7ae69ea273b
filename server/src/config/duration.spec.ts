import { parseDurationSeconds } from './duration.js';

describe('parseDurationSeconds', () => {
  it.each([
    ['90s', 90],
    ['15m', 900],
    ['8h', 28800],
    ['7d', 604800],
    ['3600', 3600],
  ])('reads %s as %d seconds', (text, seconds) => {
    expect(parseDurationSeconds(text)).toBe(seconds);
  });

  it.each(['', '0', '0h', '-5m', '1.5h', '8 hours', 'h'])('refuses %j', (text) => {
    expect(parseDurationSeconds(text)).toBeUndefined();
  });
});
