import { describe, expect, it } from 'vitest';
import { type CurveFileOptions, readCurveFile, writeCurveFile } from '../src/curve-file/index.js';

// Invented test curves: numbers chosen to show how the file is read, not measured on any device.
const nmos: CurveFileOptions = { polarity: 'nmos', w: '10u', l: '1 µm' };
const sweep = (vgs: number[], row: (v: number) => string) => vgs.map(row).join('\n');
const GATES = [0.4, 0.5, 0.6, 0.7, 0.8];

function read(text: string, options: CurveFileOptions = nmos) {
  const reading = readCurveFile(text, options);
  if (!reading.ok) throw new Error(`refused: ${JSON.stringify(reading.problems)}`);
  return reading.file;
}

function problemsOf(text: string, options: CurveFileOptions = nmos) {
  const reading = readCurveFile(text, options);
  if (reading.ok) throw new Error('the file was read, but should have been refused');
  return reading.problems;
}

describe('reading a curve file', () => {
  it('reads SI prefixes of the header units into SI numbers: mV, uA, µm and °C', () => {
    const text = `VGS [mV],VDS [V],VSB [mV],T [°C],W [um],L [µm],ID [uA]\n${sweep(GATES, (v) => `${v * 1000},1.2,300,85,20,0.5,${v * 10}`)}`;
    const file = read(text, { polarity: 'nmos' });
    expect(file.points[2]).toEqual({ vgs: 0.6, vds: 1.2, vsb: 0.3, temperature: 85, w: 20e-6, l: 0.5e-6, fingers: 1, id: 6e-6 });
    expect(file.rows).toEqual([2, 3, 4, 5, 6]);
    expect(file.convention).toBe('positive');
  });

  it('takes W, L and the temperature from the form when the file has no such columns, and VSB = 0 without a VSB column (said in the notes)', () => {
    const file = read(`VGS [V],VDS [V],ID [A]\n${sweep(GATES, (v) => `${v},0.1,${v}e-6`)}`, { ...nmos, temperature: '27' });
    expect(file.points[0]).toMatchObject({ w: 10e-6, l: 1e-6, vsb: 0, temperature: 27 });
    expect(file.notes).toContain('The file has no VSB column: every point is read at VSB = 0');
  });

  it('reads a temperature column in kelvin as °C (T[°C] = T[K] − 273.15, SI Brochure 2019)', () => {
    const file = read(`VGS [V],VDS [V],T [K],ID [A]\n${sweep(GATES, (v) => `${v},0.1,300.15,${v}e-6`)}`);
    expect(file.points[0].temperature).toBeCloseTo(27, 12);
  });

  it('groups the rows into curves, one per VDS, VSB, temperature and geometry, each a sweep of VGS', () => {
    const rows = [0.1, 1.2].flatMap((vds) => GATES.map((v) => `${v},${vds},0,27,${v * vds}e-6`));
    const file = read(`VGS [V],VDS [V],VSB [V],T [°C],ID [A]\n${rows.join('\n')}`);
    expect(file.curves.map((c) => [c.vds, c.points, c.firstRow, c.lastRow, c.vgsMin, c.vgsMax])).toEqual([
      [0.1, 5, 2, 6, 0.4, 0.8],
      [1.2, 5, 7, 11, 0.4, 0.8],
    ]);
  });

  it('reads UTF-8 with a byte-order mark, semicolons with decimal commas, quoted cells and # comment lines', () => {
    const text = `\uFEFF# invented test curve\nVGS [V];VDS [V];"ID [uA]"\n${sweep(GATES, (v) => `${String(v).replace('.', ',')};"0,1";${String(v * 2).replace('.', ',')}`)}`;
    const file = read(text, { ...nmos, temperature: '27' });
    expect(file.points.map((p) => p.id)).toEqual([0.8e-6, 1e-6, 1.2e-6, 1.4e-6, 1.6e-6]);
    expect(file.points[0].vds).toBe(0.1);
    expect(file.rows[0]).toBe(3);
    expect(file.notes).toContain('Semicolon-separated, with decimal commas: read as decimal points');
  });

  it('reads values that carry their own unit when the header gives none', () => {
    const file = read(`VGS,VDS,ID\n${sweep(GATES, (v) => `${v * 1000} mV,100m,${v * 3} uA`)}`, { ...nmos, temperature: '27' });
    expect(file.points[4]).toMatchObject({ vgs: 0.8, vds: 0.1 });
    expect(file.points[4].id).toBeCloseTo(2.4e-6, 18);
  });

  it('turns a PMOS in the negative convention (VGS, VDS ≤ 0, ID < 0) into the engine\'s positive one and says so', () => {
    const text = `VGS [V],VDS [V],VSB [V],T [°C],ID [uA]\n${sweep(GATES, (v) => `${-v},-1.2,-0.5,27,${-v * 4}`)}`;
    const file = read(text, { ...nmos, polarity: 'pmos' });
    expect(file.convention).toBe('negative');
    expect(file.points[1]).toMatchObject({ vgs: 0.5, vds: 1.2, vsb: 0.5 });
    expect(file.points[1].id).toBeCloseTo(2e-6, 18);
    expect(file.notes.some((n) => n.startsWith('A PMOS in the negative sign convention'))).toBe(true);
  });

  it('reads a PMOS in the positive convention (VSG, VSD, VBS, source-to-drain current) as it is', () => {
    const text = `VSG [V],VSD [V],VBS [V],T [°C],ISD [uA]\n${sweep(GATES, (v) => `${v},1.2,0.5,27,${v * 4}`)}`;
    const file = read(text, { ...nmos, polarity: 'pmos' });
    expect(file.convention).toBe('positive');
    expect(file.points[1]).toMatchObject({ vgs: 0.5, vds: 1.2, vsb: 0.5 });
  });

  it('reads an NMOS VBS column as −VSB, and a current measured into the other terminal with its sign turned (said)', () => {
    const file = read(`VGS [V],VDS [V],VBS [V],ID [uA]\n${sweep(GATES, (v) => `${v},1.2,-0.3,${-v}`)}`, { ...nmos, temperature: '27' });
    expect(file.points[0]).toMatchObject({ vsb: 0.3 });
    expect(file.points[0].id).toBeCloseTo(0.4e-6, 18);
    expect(file.notes.some((n) => n.includes('its sign turned'))).toBe(true);
  });
});

describe('refusing a broken curve file, naming row and column', () => {
  const header = 'VGS [V],VDS [V],T [°C],ID [uA]';
  const good = (v: number) => `${v},1.2,27,${v * 2}`;

  it('refuses a file without an ID column, naming the header row', () => {
    const [problem] = problemsOf(`VGS [V],VDS [V],T [°C]\n${sweep(GATES, (v) => `${v},1.2,27`)}`);
    expect(problem).toMatchObject({ row: 1, field: 'header' });
    expect(problem.message).toMatch(/^Row 1: there is no ID column/);
  });

  it('refuses text among the numbers, naming its row and column', () => {
    const rows = GATES.map((v, k) => (k === 2 ? '0.6,1.2,27,abc' : good(v)));
    expect(problemsOf(`${header}\n${rows.join('\n')}`)).toEqual([{ row: 4, field: 'ID [uA]', message: 'Row 4, column "ID [uA]": "abc" is not a number' }]);
  });

  it('refuses an empty cell, naming its row and column', () => {
    const rows = GATES.map((v, k) => (k === 4 ? '0.8,,27,1.6' : good(v)));
    expect(problemsOf(`${header}\n${rows.join('\n')}`)).toEqual([{ row: 6, field: 'VDS [V]', message: 'Row 6, column "VDS [V]": is empty' }]);
  });

  it('refuses a file with a single point', () => {
    const [problem] = problemsOf(`${header}\n${good(0.5)}`);
    expect(problem.message).toMatch(/a single data row; an extraction needs at least 5 points/);
  });

  it('refuses a file whose every current is zero', () => {
    const [problem] = problemsOf(`${header}\n${sweep(GATES, (v) => `${v},1.2,27,0`)}`);
    expect(problem).toMatchObject({ field: 'ID [uA]' });
    expect(problem.message).toMatch(/every current is zero/);
  });

  it('refuses mixed units: a value with a unit of its own under a header that gives another', () => {
    const rows = GATES.map((v, k) => (k === 1 ? '0.5,1.2,27,3 nA' : good(v)));
    const [problem] = problemsOf(`${header}\n${rows.join('\n')}`);
    expect(problem).toMatchObject({ row: 3, field: 'ID [uA]' });
    expect(problem.message).toMatch(/mixed units/);
  });

  it('refuses mixed units: some values with a unit and others without, under a header without one', () => {
    const rows = GATES.map((v, k) => `${v},1.2,27,${k === 3 ? '0.000001' : `${v} uA`}`);
    const [problem] = problemsOf(`VGS [V],VDS [V],T [°C],ID\n${rows.join('\n')}`);
    expect(problem).toMatchObject({ row: 5, field: 'ID' });
    expect(problem.message).toMatch(/mixed units/);
  });

  it('refuses a header unit that measures something else', () => {
    const [problem] = problemsOf(`VGS [V],VDS [uA],T [°C],ID [uA]\n${sweep(GATES, good)}`);
    expect(problem).toEqual({ row: 1, field: 'VDS [uA]', message: 'Row 1, column "VDS [uA]": "uA" does not measure a voltage (V)' });
  });

  it('refuses W both as a column and as a form field, and a missing L', () => {
    const problems = problemsOf(`VGS [V],VDS [V],T [°C],W [um],ID [uA]\n${sweep(GATES, (v) => `${v},1.2,27,10,${v}`)}`, { polarity: 'nmos', w: '10u' });
    expect(problems.map((p) => p.field)).toEqual(['w', 'l']);
    expect(problems[1].message).toMatch(/The file has no L column: give L in the form/);
  });

  it('refuses drain voltages of both signs in one file, naming the first row of the rarer sign', () => {
    const rows = GATES.map((v, k) => `${v},${k === 3 ? -1.2 : 1.2},27,${v}`);
    const [problem] = problemsOf(`${header}\n${rows.join('\n')}`);
    expect(problem).toMatchObject({ row: 5, field: 'VDS [V]' });
    expect(problem.message).toMatch(/negative here but positive elsewhere/);
  });

  it('refuses an NMOS whose every drain voltage is negative, suggesting PMOS', () => {
    const [problem] = problemsOf(`${header}\n${sweep(GATES, (v) => `${-v},-1.2,27,${-v}`)}`);
    expect(problem.message).toMatch(/choose the polarity PMOS/);
  });

  it('refuses ID–VDS sweeps, whose curves have a single VGS each', () => {
    const rows = [0.1, 0.2, 0.3, 0.4, 0.5].map((vds) => `0.8,${vds},27,${vds * 10}`);
    const [problem] = problemsOf(`${header}\n${rows.join('\n')}`);
    expect(problem.message).toMatch(/5 curves have fewer than 3 VGS values \(rows 2, 3, 4, 5, 6\)/);
  });

  it('refuses a W without its unit that reads as metres', () => {
    const [problem] = problemsOf(`VGS [V],VDS [V],T [°C],W,ID [uA]\n${sweep(GATES, (v) => `${v},1.2,27,10,${v}`)}`, { polarity: 'nmos', l: '1u' });
    expect(problem).toMatchObject({ row: 2, field: 'W' });
    expect(problem.message).toMatch(/not a plausible drawn W/);
  });

  it('lists every problem at once, at most 100 and a count of the rest', () => {
    const rows = Array.from({ length: 150 }, (_, k) => `${k / 100},x,27,1`);
    const problems = problemsOf(`${header}\n${rows.join('\n')}`);
    expect(problems).toHaveLength(101);
    expect(problems[100].message).toBe('… and 50 more problems');
  });
});

describe('writing a curve file', () => {
  // Invented points with the awkward numbers a grid gives (a sum of steps, a float32 current).
  const points = [0.3, 0.1 + 0.2, 0.7, 0.9, 1.1].map((vgs, k) => ({ vgs: vgs + k * 0.05, vds: 1.25, vsb: 0.5, temperature: 27, w: 10e-6, l: 0.25e-6, id: Math.fround(1.234567e-5 * (k + 1)) }));

  it('is read back as the same points, with its comments skipped, for an NMOS and for a PMOS in the positive convention', () => {
    for (const polarity of ['nmos', 'pmos'] as const) {
      const text = writeCurveFile(polarity, points, ['Points of a characterised table', 'second line']);
      expect(text.split('\n').slice(0, 2)).toEqual(['# Points of a characterised table', '# second line']);
      const file = read(text, { polarity });
      expect(file.convention).toBe('positive');
      file.points.forEach((p, k) => {
        expect(p).toMatchObject({ vds: 1.25, vsb: 0.5, temperature: 27, fingers: 1 });
        expect(Math.abs(p.vgs - points[k].vgs)).toBeLessThan(1e-12);
        expect(Math.abs(p.w / 10e-6 - 1) + Math.abs(p.l / 0.25e-6 - 1)).toBeLessThan(1e-12);
        expect(Math.abs(p.id / points[k].id - 1)).toBeLessThan(1e-8);
      });
    }
  });

  it('names a PMOS\'s columns from the source side, and writes sums of steps without their binary noise', () => {
    const text = writeCurveFile('pmos', points);
    expect(text.split('\n')[0]).toBe('VSG [V],VSD [V],VBS [V],T [°C],W [um],L [um],NF,ISD [A]');
    expect(text).not.toMatch(/0000000000/);
  });
});
