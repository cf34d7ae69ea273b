import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { readProcessCsv } from './read-process-csv.js';

const GOOD = readFileSync(join(__dirname, '../../../test/fixtures/processes/good-process.csv'), 'utf8');

/** The good fixture with one line replaced (or removed when `by` is empty). */
const withLine = (line: string, by: string) => {
  if (!GOOD.includes(`${line}\n`)) throw new Error(`no line ${line}`);
  return GOOD.replace(`${line}\n`, by === '' ? '' : `${by}\n`);
};
const lineNumber = (text: string, line: string) => text.split('\n').indexOf(line) + 1;
const problemsOf = (text: string) => {
  const reading = readProcessCsv(text);
  if (reading.ok) throw new Error('expected the file to be refused');
  return reading.problems;
};

describe('readProcessCsv', () => {
  it('reads the good fixture, whose line endings may also be CRLF', () => {
    const lf = readProcessCsv(GOOD);
    const crlf = readProcessCsv(GOOD.replace(/\n/g, '\r\n'));
    expect(lf.ok && lf.definition.nmos.kp).toBe(310e-6);
    expect(crlf).toEqual(lf);
  });

  it('counts rows as lines of the file even after a quoted cell that spans lines', () => {
    const text = withLine('description,process,"Invented demo data, not any foundry\'s process. A 160 nm-class test profile.",', 'description,process,"two\nlines",')
      .replace('vt0,nmos,0.42,V', 'vt0,nmos,0.42,A');
    expect(problemsOf(text)).toEqual([{ row: lineNumber(text, 'vt0,nmos,0.42,A'), field: 'unit', message: expect.stringContaining('vt0 (nmos) takes a voltage (V)') }]);
  });

  it('matches parameter names and polarities regardless of case', () => {
    const reading = readProcessCsv(withLine('kp,nmos,310u,A/V²', 'KP,NMOS,311u,A/V²'));
    expect(reading.ok && reading.definition.nmos.kp).toBe(311e-6);
  });

  it('reads a value whose unit starts with a digit, and a percentage', () => {
    const reading = readProcessCsv(withLine('lambda,nmos,0.09,1/V', 'lambda,nmos,90m,1/V').replace('corner.SS.kpScale,nmos,0.92,', 'corner.SS.kpScale,nmos,92,%'));
    expect(reading.ok && reading.definition.nmos.lambda).toBe(0.09);
    expect(reading.ok && reading.definition.corners.find((c) => c.name === 'SS')?.nmos.kpScale).toBe(0.92);
    const plain = readProcessCsv(GOOD);
    expect(plain.ok && [plain.definition.nmos.lambda, plain.definition.pmos.lambda]).toEqual([0.09, 0.11]);
  });

  it('refuses a unit written both after the value and in the unit cell', () => {
    const text = withLine('vdd,process,1.5,V', 'vdd,process,1.5 V,V');
    expect(problemsOf(text)).toEqual([{ row: lineNumber(text, 'vdd,process,1.5 V,V'), field: 'value', message: 'vdd: "1.5 V" carries a unit and the unit cell says "V": write the unit once' }]);
  });

  it('refuses a unit in the value cell that is not the parameter\'s', () => {
    const text = withLine('kp,pmos,70 µA/V²,', 'kp,pmos,70 µA,');
    expect(problemsOf(text)).toEqual([{ row: lineNumber(text, 'kp,pmos,70 µA,'), field: 'value', message: expect.stringContaining('70 µA is a current (A)') }]);
  });

  it('puts a value beyond its hard limits on its own row, and takes one that is only outside the plausible range', () => {
    const text = withLine('vt0,nmos,0.42,V', 'vt0,nmos,7,V');
    expect(problemsOf(text)).toEqual([{ row: lineNumber(text, 'vt0,nmos,7,V'), field: 'value', message: expect.stringMatching(/^vt0 \(nmos\): vt0 must be in -5 V … 5 V$/) }]);
    const unusual = readProcessCsv(withLine('vt0,nmos,0.42,V', 'vt0,nmos,2,V'));
    expect(unusual.ok && unusual.definition.nmos.vt0).toBe(2);
  });

  it('refuses process-level fields under a device polarity and device parameters under "process"', () => {
    const text = withLine('vdd,process,1.5,V', 'vdd,nmos,1.5,V').replace('vt0,nmos,0.42,V', 'vt0,process,0.42,V');
    expect(problemsOf(text)).toEqual([
      { row: lineNumber(text, 'vdd,nmos,1.5,V'), field: 'polarity', message: 'vdd is a process-level field: its polarity is "process", not "nmos"' },
      { row: lineNumber(text, 'vt0,process,0.42,V'), field: 'polarity', message: 'vt0: polarity must be nmos or pmos, not "process"' },
    ]);
  });

  it('refuses an unknown parameter, a corner field other than dvt and kpScale, and a flavour given two polarities', () => {
    const text = `${GOOD}vth,nmos,0.4,V\ncorner.FF.vt0,nmos,0.1,V\nflavour.native.kp,pmos,300u,A/V²\n`;
    const problems = problemsOf(text);
    expect(problems.map((p) => [p.row, p.field])).toEqual([
      [lineNumber(text, 'vth,nmos,0.4,V'), 'parameter'],
      [lineNumber(text, 'corner.FF.vt0,nmos,0.1,V'), 'parameter'],
      [lineNumber(text, 'flavour.native.kp,pmos,300u,A/V²'), 'polarity'],
    ]);
    expect(problems[2].message).toContain('flavour native is nmos');
  });

  it('refuses a wrong header, and a row with too many cells', () => {
    expect(problemsOf(GOOD.replace('parameter,polarity,value,unit', 'name,value'))).toEqual([
      { row: 1, field: 'header', message: 'The first row must be the header parameter,polarity,value,unit, not "name,value"' },
    ]);
    const text = withLine('vdd,process,1.5,V', 'vdd,process,1,5,V');
    expect(problemsOf(text)).toEqual([{ row: lineNumber(text, 'vdd,process,1,5,V'), field: 'columns', message: expect.stringContaining('The row has 5 cells, not 4') }]);
  });

  it('refuses a TT corner that is not the nominal parameters', () => {
    const text = withLine('corner.TT.dvt,pmos,0,V', 'corner.TT.dvt,pmos,10m,V');
    expect(problemsOf(text)).toEqual([{ row: lineNumber(text, 'corner.TT.dvt,pmos,10m,V'), field: 'value', message: expect.stringContaining('TT means the nominal parameters') }]);
  });

  it('lists a problem in every row at once', () => {
    const text = withLine('vt0,nmos,0.42,V', 'vt0,nmos,abc,V').replace('kp,nmos,310u,A/V²', 'kp,nmos,310u,V').replace('gamma,pmos,0.38,V^0.5', 'gamma,,0.38,V^0.5');
    expect(problemsOf(text).map((p) => p.field)).toEqual(['value', 'unit', 'polarity']);
  });
});
