import { describe, expect, it } from 'vitest';
import { cardMappingProblems, checkModelCard, guessCardMapping, parseModelCard } from '../src/model-card/index.js';

const lines = (...text: string[]) => text.join('\n');
const CARD = lines(
  '* an invented test card',
  '.lib tt',
  '.model n18 nmos level=54 vth0=0.45',
  '.model p18 pmos level=54 vth0=-0.46',
  '.model n18na nmos level=54 vth0=-0.12',
  '.endl tt',
  '.lib ss',
  '.model n18 nmos level=54 vth0=0.49',
  '.model p18 pmos level=54 vth0=-0.5',
  '.model n18na nmos level=54 vth0=-0.08',
  '.endl ss',
);
const TARGET = { corners: ['TT', 'FF', 'SS'], flavours: [{ name: 'native', polarity: 'nmos' as const }] };

describe('checkModelCard', () => {
  it('lists every refused line of a card, each with its own line number, not just the first', () => {
    const check = checkModelCard(lines('.model n1 nmos level=54 vth0=0.4', '.control', 'shell touch /tmp/x', '.endc', '.include other.lib', '.option reltol=1e-3'));
    expect(check.card).toBeNull();
    expect(check.problems.map((p) => p.line)).toEqual([2, 3, 4, 5, 6]);
    expect(check.problems.every((p) => p.code === 'MODEL_CARD_REFUSED')).toBe(true);
    expect(check.problems[0].reason).toMatch(/\.control/);
  });

  it('gives the parsed card and no problem for an accepted card', () => {
    const check = checkModelCard(CARD);
    expect(check.problems).toEqual([]);
    expect(check.card?.sections.map((s) => s.name)).toEqual(['tt', 'ss']);
  });

  it('stops at the number of problems asked for', () => {
    const text = Array.from({ length: 50 }, (_, i) => `r${i} a b 1k`).join('\n');
    expect(checkModelCard(text, 5).problems).toHaveLength(5);
  });
});

describe('guessCardMapping', () => {
  const card = parseModelCard(CARD);

  it('maps corners to the sections named like them, a flavour to the model named after it, NMOS and PMOS to the plain models', () => {
    expect(guessCardMapping(card, TARGET)).toEqual({
      corners: { TT: 'tt', SS: 'ss' },
      devices: [
        { model: 'n18na', polarity: 'nmos', flavour: 'native' },
        { model: 'n18', polarity: 'nmos' },
        { model: 'p18', polarity: 'pmos' },
      ],
    });
  });

  it('gives the statements of a card without sections to TT', () => {
    expect(guessCardMapping(parseModelCard('.model n1 nmos level=54'), TARGET)).toEqual({ corners: { TT: null }, devices: [{ model: 'n1', polarity: 'nmos' }] });
  });

  it('finds nothing wrong with its own guess', () => {
    expect(cardMappingProblems(card, guessCardMapping(card, TARGET), TARGET)).toEqual([]);
  });
});

describe('cardMappingProblems', () => {
  const card = parseModelCard(CARD);

  it('names each wrong entry: a corner the process lacks, a section or model the card lacks, the wrong polarity, a flavour the process lacks, a device mapped twice', () => {
    const problems = cardMappingProblems(
      card,
      {
        corners: { TT: 'tt', XX: 'tt', FF: 'ff' },
        devices: [
          { model: 'n18', polarity: 'nmos' },
          { model: 'p18', polarity: 'nmos', flavour: 'native' },
          { model: 'nope', polarity: 'pmos' },
          { model: 'n18na', polarity: 'nmos', flavour: 'lvt' },
          { model: 'n18', polarity: 'nmos' },
        ],
      },
      TARGET,
    );
    expect(problems.map((p) => p.field)).toEqual([
      'mapping.corners.XX',
      'mapping.corners.FF',
      'mapping.devices.1.polarity',
      'mapping.devices.2.model',
      'mapping.devices.3.flavour',
      'mapping.devices.4',
    ]);
  });

  it('refuses a corner whose section lacks a mapped model', () => {
    const partial = parseModelCard(lines('.lib tt', '.model n18 nmos level=54', '.model n18na nmos level=54', '.endl', '.lib ss', '.model n18 nmos level=54', '.endl'));
    const problems = cardMappingProblems(partial, { corners: { TT: 'tt', SS: 'ss' }, devices: [{ model: 'n18na', polarity: 'nmos', flavour: 'native' }] }, TARGET);
    expect(problems).toEqual([{ field: 'mapping.corners.SS', message: expect.stringMatching(/Section ss of corner SS has no model n18na/) }]);
  });
});
