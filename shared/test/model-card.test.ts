import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { emitModelCard, type ModelCard, ModelCardError, parseModelCard, parseSpiceNumber } from '../src/model-card/index.js';

/** The error a refused card throws (fails the test when the card is accepted). */
function refusalOf(text: string): ModelCardError {
  try {
    parseModelCard(text);
  } catch (error) {
    if (error instanceof ModelCardError) return error;
    throw error;
  }
  throw new Error('the card was accepted');
}

const lines = (...text: string[]) => text.join('\n');
const MODEL = '.model nch nmos level=54 vth0=0.45';

describe('SPICE numbers', () => {
  it('reads the SPICE scale suffixes, with "m" as milli and "meg" as mega (SPICE3 Version 3f3 User Manual, UC Berkeley, 1993; from memory)', () => {
    expect(parseSpiceNumber('1.2n')).toBeCloseTo(1.2e-9, 21);
    expect(parseSpiceNumber('3meg')).toBe(3e6);
    expect(parseSpiceNumber('3MEG')).toBe(3e6);
    expect(parseSpiceNumber('10u')).toBeCloseTo(10e-6, 18);
    expect(parseSpiceNumber('2m')).toBe(2e-3);
    expect(parseSpiceNumber('1mil')).toBeCloseTo(25.4e-6, 18);
    expect(parseSpiceNumber('4k')).toBe(4000);
    expect(parseSpiceNumber('5f')).toBeCloseTo(5e-15, 27);
    expect(parseSpiceNumber('1.8e17')).toBe(1.8e17);
    expect(parseSpiceNumber('-.5')).toBe(-0.5);
  });

  it('reads a suffixed number as the decimal it means ("4.1n" is exactly 4.1e-9, "1.5e3k" is 1.5e6)', () => {
    expect(parseSpiceNumber('4.1n')).toBe(4.1e-9);
    expect(parseSpiceNumber('0.18u')).toBe(0.18e-6);
    expect(parseSpiceNumber('1.5e3k')).toBe(1.5e6);
    expect(parseSpiceNumber('2E-3MEG')).toBe(2e3);
  });

  it('ignores letters after the scale suffix as a unit, as SPICE does ("10uF" is 10e-6)', () => {
    expect(parseSpiceNumber('10uF')).toBeCloseTo(10e-6, 18);
    expect(parseSpiceNumber('0.45V')).toBe(0.45);
  });

  it('gives undefined for text that is not a number', () => {
    for (const text of ['abc', '', '1.2.3', '0.4+0.1', 'exp(1)', '{x}', '--1']) expect(parseSpiceNumber(text)).toBeUndefined();
  });
});

describe('parseModelCard: the accepted subset', () => {
  it('reads a .model with + continuation lines into name, polarity, level and lower-case numeric parameters', () => {
    const card = parseModelCard(lines('* an invented card', '.MODEL NCH NMOS LEVEL=54 VERSION=4.8.2', '+ VTH0=0.45 toxe=4.1n', '+ u0 = 0.037  vsat=90k'));
    expect(card.sections).toHaveLength(1);
    expect(card.sections[0].name).toBeNull();
    const [model] = card.sections[0].models;
    expect(model).toMatchObject({ name: 'nch', polarity: 'nmos', level: 54, version: '4.8.2' });
    expect(model.parameters.vth0).toBe(0.45);
    expect(model.parameters.toxe).toBe(4.1e-9);
    expect(model.parameters.u0).toBe(0.037);
    expect(model.parameters.vsat).toBe(90e3);
    expect(Object.keys(model.parameters)).toEqual(['vth0', 'toxe', 'u0', 'vsat']);
  });

  it('accepts the parameters inside parentheses, on one line or across continuation lines', () => {
    const one = parseModelCard('.model p1 pmos(level=8 vth0=-0.4 u0=0.01)');
    const many = parseModelCard(lines('.model p1 pmos (', '+ level=8 vth0=-0.4', '+ u0=0.01 )'));
    expect(one).toEqual(many);
    expect(one.sections[0].models[0]).toMatchObject({ polarity: 'pmos', level: 8, parameters: { vth0: -0.4, u0: 0.01 } });
  });

  it('gives level 1 to a model that states no level, as SPICE does', () => {
    expect(parseModelCard('.model n1 nmos vto=0.7 kp=100u').sections[0].models[0].level).toBe(1);
  });

  it('accepts each of the levels 1, 2, 3, 8, 49, 14 and 54', () => {
    for (const level of [1, 2, 3, 8, 49, 14, 54]) expect(parseModelCard(`.model m nmos level=${level}`).sections[0].models[0].level).toBe(level);
  });

  it('groups models by .lib section, in the order of the card, with the unnamed models first', () => {
    const card = parseModelCard(lines('.model top nmos level=1', '.lib TT', MODEL, '.model pch pmos level=54 vth0=-0.46', '.endl TT', '.lib ss', MODEL, '.endl'));
    expect(card.sections.map((s) => [s.name, s.models.map((m) => m.name)])).toEqual([
      [null, ['top']],
      ['tt', ['nch', 'pch']],
      ['ss', ['nch']],
    ]);
  });

  it('skips * comment lines, ; and $ end-of-line comments and blank lines, also between continuation lines', () => {
    const card = parseModelCard(lines('* header', '', '.model n1 nmos level=54 ; the NMOS', '* a comment inside the statement', '+ vth0=0.4 $ threshold', '', '+ k1=0.5'));
    expect(card.sections[0].models[0].parameters).toEqual({ vth0: 0.4, k1: 0.5 });
  });

  it('replaces a .param used as {name} or as a bare name by its number', () => {
    const card = parseModelCard(lines('.param vthn=0.42 tox = 4n', '.model n1 nmos level=54 vth0={vthn} toxe=tox'));
    expect(card.sections[0].models[0].parameters).toEqual({ vth0: 0.42, toxe: 4e-9 });
  });

  it('keeps a .param defined inside a section to that section', () => {
    expect(parseModelCard(lines('.lib tt', '.param d=0.01', '.model n1 nmos vto=d', '.endl')).sections[0].models[0].parameters.vto).toBe(0.01);
    const error = refusalOf(lines('.lib tt', '.param d=0.01', '.model n1 nmos vto=d', '.endl', '.lib ss', '.model n1 nmos vto=d', '.endl'));
    expect(error.line).toBe(6);
    expect(error.reason).toMatch(/neither a number nor a \.param/);
  });

  it('accepts Windows line endings and counts lines the same', () => {
    const error = refusalOf(['* a', '.model n1 nmos level=54', '.control'].join('\r\n'));
    expect(error.line).toBe(3);
  });
});

describe('parseModelCard: each refused construct is refused with its line', () => {
  const cases: [string, string, number, RegExp][] = [
    ['a .control block', lines('* card', MODEL, '.control', 'shell rm -rf /', '.endc'), 3, /\.control block runs simulator commands/],
    ['a lone .endc', lines(MODEL, '.endc'), 2, /\.control block/],
    ['an .include', lines(MODEL, '', '.include /etc/passwd'), 3, /reads another file/],
    ['an .inc', lines('.inc models.lib', MODEL), 1, /reads another file/],
    ['a .lib with a file name', lines(MODEL, '.lib other.lib tt'), 2, /\.lib with a file name/],
    ['an .option', lines(MODEL, '.option temp=100'), 2, /options are set by Channelwright/],
    ['an .options', lines('.options gmin=1e-3', MODEL), 1, /options are set by Channelwright/],
    ['a .subckt', lines(MODEL, '.subckt inv a y', 'm1 y a 0 0 nch', '.ends'), 2, /subcircuits/],
    ['a behavioural source', lines(MODEL, 'b1 out 0 v=v(in)*2'), 2, /behavioural source/],
    ['an instance line', lines(MODEL, '* a device', 'm1 d g s b nch w=1u l=1u'), 3, /circuit element/],
    ['an .exec', lines(MODEL, '.exec shell ls'), 2, /\.exec runs simulator commands/],
    ['a shell command', lines('shell touch /tmp/x', MODEL), 1, /shell command/],
    ['an unknown dot-command', lines(MODEL, '.temp 125'), 2, /\.temp is not accepted/],
    ['a .func', lines('.func f(x) = x*2', MODEL), 1, /functions/],
    ['an .end', lines(MODEL, '.end'), 2, /\.end is not accepted/],
    ['a function in a value', lines(MODEL, '.model n2 nmos level=54', '+ vth0=exp(0.1)'), 3, /functions are not accepted/],
    ['a function in braces', lines('.model n2 nmos level=54 vth0={exp(0.1)}'), 1, /expression/],
    ['an arithmetic expression in braces', lines('.param a=1', '.model n2 nmos level=54 vth0={a+0.1}'), 2, /expression/],
    ['an arithmetic expression', lines('.model n2 nmos level=54', '+ vth0=0.4+0.1'), 2, /expression/],
    ['a quoted expression', lines(MODEL, ".param x='0.4*2'"), 2, /quoted text/],
    ['a parenthesised expression', lines('.model n2 nmos level=54 vth0=(0.4)'), 1, /expressions are not accepted/],
    ['a non-numeric value', lines(MODEL, '.model n2 nmos level=54', '+ toxe=thin'), 3, /neither a number nor a \.param/],
    ['a level outside the subset', lines('.model n2 nmos level=72 vth0=0.4'), 1, /level 72/],
    ['a model that is not a MOSFET', lines('.model d1 d is=1e-14'), 1, /only nmos and pmos/],
    ['a .lib that is never closed', lines('* x', '.lib tt', MODEL), 2, /not closed by \.endl/],
    ['an .endl without a .lib', lines(MODEL, '.endl tt'), 2, /without a \.lib/],
    ['an .endl naming another section', lines('.lib tt', MODEL, '.endl ss'), 3, /names differ/],
    ['a nested .lib', lines('.lib tt', '.lib ss', MODEL, '.endl', '.endl'), 2, /not closed by \.endl/],
    ['a section without models', lines('.lib tt', '.endl', '.lib ss', MODEL, '.endl'), 1, /holds no \.model/],
    ['a model defined twice in a section', lines('.lib tt', MODEL, MODEL, '.endl'), 3, /defined twice/],
    ['a parameter given twice', lines('.model n1 nmos level=54 vth0=0.4', '+ vth0=0.5'), 2, /given twice/],
    ['a continuation with nothing before it', lines('* only a comment', '+ vth0=0.4'), 2, /no statement before it/],
    ['a parameter without a value', lines('.model n1 nmos level=54 vth0'), 1, /not name=value/],
    ['a card without models', lines('* nothing here', ''), 1, /no \.model/],
  ];
  for (const [what, text, line, reason] of cases) {
    it(`refuses ${what} at line ${line}`, () => {
      const error = refusalOf(text);
      expect(error.line).toBe(line);
      expect(error.reason).toMatch(reason);
      expect(error.message).toBe(`Line ${line}: ${error.reason}`);
      expect(['MODEL_CARD_REFUSED', 'MODEL_CARD_INVALID']).toContain(error.code);
      expect(error.field).toBe('card');
    });
  }

  it('marks constructs outside the subset as refused and malformed accepted ones as invalid', () => {
    expect(refusalOf(lines(MODEL, '.control')).code).toBe('MODEL_CARD_REFUSED');
    expect(refusalOf(lines('.lib tt', MODEL)).code).toBe('MODEL_CARD_INVALID');
  });
});

describe('emitModelCard', () => {
  const SOURCE = lines(
    '* secret comment that must not reach the simulator',
    '.param vt=0.45',
    '.lib tt',
    '.model nch nmos (level=54 version=4.8.2 vth0={vt} toxe=4.1n ndep=1.8e17 u0=0.037 ua=-1e-9 vsat=90k',
    '+ cgso=3.6e-10 kt1=-0.28 a1=0 a2=1 b0=0 b1=0 keta=-0.02 tnom=27)',
    '.endl tt',
  );

  it('writes its own text: no comment, .param or expression of the upload survives', () => {
    const text = emitModelCard(parseModelCard(SOURCE));
    expect(text).not.toMatch(/secret|\.param|\{|\(/);
    expect(text).toMatch(/^\.model nch nmos level=54 version=4\.8\.2$/m);
    expect(text).toMatch(/^\.lib tt$/m);
    expect(text).toMatch(/^\.endl tt$/m);
  });

  it('round-trips: parsing the emitted text gives the same card', () => {
    const card = parseModelCard(SOURCE);
    expect(parseModelCard(emitModelCard(card))).toEqual(card);
  });

  it('round-trips any card of random names, levels and values exactly', () => {
    const name = fc.stringMatching(/^[a-z][a-z0-9_]{0,8}$/);
    const value = fc.double({ noNaN: true, noDefaultInfinity: true }).map((x) => x + 0);
    const model = fc.record({
      name,
      polarity: fc.constantFrom('nmos' as const, 'pmos' as const),
      level: fc.constantFrom(1, 2, 3, 8, 49, 14, 54),
      parameters: fc.dictionary(name.filter((n) => n !== 'level' && n !== 'version'), value, { maxKeys: 20 }),
    });
    const section = fc.record({ name: fc.option(name, { nil: null }), models: fc.uniqueArray(model, { minLength: 1, maxLength: 4, selector: (m) => m.name }) });
    const card = fc.uniqueArray(section, { minLength: 1, maxLength: 4, selector: (s) => s.name ?? '' }).map((sections): ModelCard => ({
      sections: [...sections.filter((s) => s.name === null), ...sections.filter((s) => s.name !== null)],
    }));
    fc.assert(
      fc.property(card, (c) => {
        expect(parseModelCard(emitModelCard(c))).toEqual(c);
      }),
    );
  });
});
