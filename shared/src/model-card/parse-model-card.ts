import { ACCEPTED_LEVELS, type CardSection, type ModelCard, ModelCardError, type ModelPolarity, type ModelStatement } from './model-card.js';
import { parseSpiceNumber } from './spice-number.js';

/** A word of a statement and the physical line it came from (continuations keep their own line). */
interface Token {
  text: string;
  line: number;
}

/** One statement: its first physical line and the `+` lines that continue it, comments already cut. */
interface Statement {
  line: number;
  pieces: { content: string; line: number }[];
}

/** Dot-commands outside the subset, with the reason a designer is given. */
const REFUSED_COMMANDS: Record<string, string> = {
  '.control': 'a .control block runs simulator commands; a model card may hold only .model, .lib/.endl and .param statements',
  '.endc': 'a .control block runs simulator commands; a model card may hold only .model, .lib/.endl and .param statements',
  '.include': 'an .include reads another file; paste the models it holds into this card instead',
  '.inc': 'an .inc reads another file; paste the models it holds into this card instead',
  '.option': 'simulator options are set by Channelwright, not by the card',
  '.options': 'simulator options are set by Channelwright, not by the card',
  '.opt': 'simulator options are set by Channelwright, not by the card',
  '.subckt': 'subcircuits are not accepted; a model card may hold only .model statements',
  '.ends': 'subcircuits are not accepted; a model card may hold only .model statements',
  '.exec': '.exec runs simulator commands, which a model card may not',
  '.func': 'functions are not accepted; give every parameter as a plain number',
  '.end': '.end is not accepted; end the card after its last statement',
};

const NAME = /^[a-z_][a-z0-9_.-]*$/;
const PARAMETER_NAME = /^[a-z_][a-z0-9_]*$/;
const VERSION = /^\d+(?:\.\d+)*$/;

/**
 * Parses the accepted subset of a SPICE model card: `.model <name> nmos|pmos [(] [level=<n>] <param>=<value> … [)]`
 * with `+` continuation lines, `.lib <section>` … `.endl [<section>]` groups, `.param <name>=<number>`, `*` comment
 * lines, `;` and `$` end-of-line comments and blank lines. A value is a SPICE number ("1.2n", "3meg", "10u") or
 * the name of a `.param` defined above it, bare or in braces ({vthn}); a `.param` inside a section holds only
 * until its `.endl`. Anything else is refused with its 1-based line and the reason (ModelCardError), so that
 * nothing but the re-emitted statements ever reaches a simulator.
 */
export function parseModelCard(text: string): ModelCard {
  const global = new Map<string, number>();
  let local: Map<string, number> | null = null;
  const lookup = (name: string) => local?.get(name) ?? global.get(name);
  const unnamed: CardSection = { name: null, models: [] };
  const sections: { section: CardSection; line: number }[] = [];
  let open: { section: CardSection; line: number } | null = null;

  for (const statement of joinStatements(text)) {
    const command = statement.pieces[0].content.split(/\s/, 1)[0].toLowerCase();
    if ((command === '.lib' || command === '.endl') && statement.pieces.length > 1) {
      throw invalid(statement.pieces[1].line, `a continuation line (+) may continue only .model or .param, not ${command}`);
    }
    if (command === '.model') {
      const target = open ? open.section : unnamed;
      const model = parseModel(statement, tokensOf(statement), lookup);
      if (target.models.some((m) => m.name === model.name)) {
        throw invalid(statement.line, `model ${model.name} is defined twice in ${target.name === null ? 'the card' : `section ${target.name}`}`);
      }
      target.models.push(model);
    } else if (command === '.param') {
      parseParams(statement, tokensOf(statement).slice(1), local ?? global, lookup);
    } else if (command === '.lib') {
      const rest = tokensOf(statement).slice(1);
      if (rest.length >= 2) throw refused(statement.line, 'a .lib with a file name reads another file; paste the sections it holds into this card instead');
      if (rest.length === 0) throw invalid(statement.line, '.lib needs a section name (.lib tt)');
      if (open) throw invalid(statement.line, `.lib ${rest[0].text} starts inside section ${open.section.name}, which is not closed by .endl`);
      const name = sectionName(rest[0]);
      if (sections.some((s) => s.section.name === name)) throw invalid(statement.line, `section ${name} is defined twice`);
      open = { section: { name, models: [] }, line: statement.line };
      sections.push(open);
      local = new Map();
    } else if (command === '.endl') {
      const rest = tokensOf(statement).slice(1);
      if (!open) throw invalid(statement.line, '.endl without a .lib section to close');
      if (rest.length > 1) throw invalid(statement.line, '.endl takes at most the section name');
      if (rest.length === 1 && sectionName(rest[0]) !== open.section.name) {
        throw invalid(statement.line, `.endl ${rest[0].text} closes section ${open.section.name}; the names differ`);
      }
      open = null;
      local = null;
    } else {
      throw refusal(statement.line, statement.pieces[0].content.split(/\s/, 1)[0]);
    }
  }
  if (open) throw invalid(open.line, `section ${open.section.name} is not closed by .endl`);
  const empty = sections.find((s) => s.section.models.length === 0);
  if (empty) throw invalid(empty.line, `section ${empty.section.name} holds no .model statement`);
  const all = [...(unnamed.models.length > 0 ? [unnamed] : []), ...sections.map((s) => s.section)];
  if (all.length === 0) throw invalid(1, 'the card holds no .model statement');
  return { sections: all };
}

/** Lines → statements: comments and blank lines dropped, `+` lines kept with the statement they continue. */
function joinStatements(text: string): Statement[] {
  const statements: Statement[] = [];
  const lines = text.split(/\r\n|\r|\n/);
  for (let index = 0; index < lines.length; index++) {
    const line = index + 1;
    const content = withoutComment(lines[index]).trim();
    if (content === '' || content.startsWith('*')) continue;
    if (content.startsWith('+')) {
      const last = statements[statements.length - 1];
      if (!last) throw invalid(line, 'a continuation line (+) with no statement before it');
      last.pieces.push({ content: content.slice(1), line });
    } else {
      statements.push({ line, pieces: [{ content, line }] });
    }
  }
  return statements;
}

function tokensOf(statement: Statement): Token[] {
  return statement.pieces.flatMap((piece) => tokenise(piece.content, piece.line));
}

/** Cuts a `;` or `$` comment off the end of a line. */
function withoutComment(line: string): string {
  const cut = line.search(/[;$]/);
  return cut === -1 ? line : line.slice(0, cut);
}

/** Words of one line: `name = value` joined to `name=value`, parentheses and `{name}` made separate, expressions refused. */
function tokenise(content: string, line: number): Token[] {
  if (/['"]/.test(content)) throw refused(line, 'quoted text is not accepted: a model card holds no file names or expressions, only plain numbers');
  if (/=\s*[a-z_][a-z0-9_]*\s*\(/i.test(content)) throw refused(line, 'functions are not accepted; give every value as a plain number');
  if (/=\s*\(/.test(content)) throw refused(line, 'expressions are not accepted; give every value as a plain number');
  const braced = content.replace(/\{([^{}]*)\}/g, (_, inner: string) => {
    const name = inner.trim();
    if (!PARAMETER_NAME.test(name.toLowerCase())) throw refused(line, `the expression {${inner}} is not accepted; give a plain number or the name of a .param`);
    return name;
  });
  if (/[{}]/.test(braced)) throw refused(line, 'unbalanced or nested braces; give every value as a plain number');
  const spaced = braced.replace(/\s*=\s*/g, '=').replace(/[()]/g, ' $& ');
  return spaced
    .split(/\s+/)
    .filter((text) => text !== '')
    .map((text) => ({ text, line }));
}

function parseModel(statement: Statement, tokens: Token[], lookup: (name: string) => number | undefined): ModelStatement {
  const { line } = statement;
  const rest = tokens.slice(1);
  if (rest.length < 2) throw invalid(line, '.model needs a name and a type (.model nch nmos level=54 …)');
  const [nameToken, typeToken, ...given] = rest;
  const name = nameToken.text.toLowerCase();
  if (!NAME.test(name)) throw invalid(line, `${nameToken.text} is not a model name (letters, digits, _ . -; starting with a letter)`);
  const type = typeToken.text.toLowerCase();
  if (type !== 'nmos' && type !== 'pmos') throw refused(typeToken.line, `model ${name} is of type ${typeToken.text}; only nmos and pmos models are accepted`);

  let words = given;
  if (words[0]?.text === '(') {
    if (words[words.length - 1]?.text !== ')') throw invalid(words[0].line, `the parameters of model ${name} open a parenthesis that is never closed`);
    words = words.slice(1, -1);
  }
  const model: ModelStatement = { name, polarity: type as ModelPolarity, level: 1, parameters: {} };
  const seen = new Set<string>();
  for (const word of words) {
    if (word.text === '(' || word.text === ')') throw refused(word.line, `parentheses inside the parameters of model ${name}: functions and expressions are not accepted`);
    const [key, value] = splitAssignment(word, `model ${name}`);
    if (seen.has(key)) throw invalid(word.line, `parameter ${key} of model ${name} is given twice`);
    seen.add(key);
    if (key === 'version') {
      if (!VERSION.test(value)) throw invalid(word.line, `version=${value} of model ${name} is not a version number such as 4.8.2`);
      model.version = value;
      continue;
    }
    const number = valueOf(word, key, value, lookup);
    if (key === 'level') {
      if (!ACCEPTED_LEVELS.includes(number)) throw refused(word.line, `model ${name} has level ${value}; accepted are levels 1, 2, 3, 8 or 49 (BSIM3) and 14 or 54 (BSIM4)`);
      model.level = number;
      continue;
    }
    model.parameters[key] = number;
  }
  return model;
}

function parseParams(statement: Statement, rest: Token[], into: Map<string, number>, lookup: (name: string) => number | undefined): void {
  if (rest.length === 0) throw invalid(statement.line, '.param needs name=value');
  for (const word of rest) {
    if (word.text === '(' || word.text === ')') throw refused(word.line, 'parentheses in a .param: functions and expressions are not accepted');
    const [key, value] = splitAssignment(word, '.param');
    into.set(key, valueOf(word, key, value, lookup));
  }
}

function splitAssignment(word: Token, where: string): [string, string] {
  const equals = word.text.indexOf('=');
  if (equals <= 0 || equals === word.text.length - 1) throw invalid(word.line, `${word.text} in ${where} is not name=value`);
  const key = word.text.slice(0, equals).toLowerCase();
  const value = word.text.slice(equals + 1);
  if (!PARAMETER_NAME.test(key)) throw invalid(word.line, `${word.text.slice(0, equals)} in ${where} is not a parameter name`);
  if (value.includes('=')) throw invalid(word.line, `${word.text} in ${where} is not name=value`);
  return [key, value];
}

function valueOf(word: Token, key: string, value: string, lookup: (name: string) => number | undefined): number {
  const number = parseSpiceNumber(value);
  if (number !== undefined) return number;
  const lower = value.toLowerCase();
  if (PARAMETER_NAME.test(lower)) {
    const defined = lookup(lower);
    if (defined !== undefined) return defined;
    throw invalid(word.line, `${key}=${value}: ${value} is neither a number nor a .param defined above`);
  }
  if (/[-+*/^<>!&|?:,]/.test(value.replace(/^[+-]/, '').replace(/e[+-]/gi, ''))) {
    throw refused(word.line, `${key}=${value} is an expression; give a plain number`);
  }
  throw invalid(word.line, `${key}=${value} is not a number`);
}

function sectionName(token: Token): string {
  const name = token.text.toLowerCase();
  if (!NAME.test(name)) throw invalid(token.line, `${token.text} is not a section name`);
  return name;
}

/** Why a statement that is not in the subset is refused. */
function refusal(line: number, head: string): ModelCardError {
  const word = head.toLowerCase();
  if (word.startsWith('.')) return refused(line, REFUSED_COMMANDS[word] ?? `${head} is not accepted; a model card may hold only .model, .lib/.endl and .param statements`);
  if (word === 'shell' || word === 'exec') return refused(line, `${head} is a shell command, which a model card may never hold`);
  if (word.startsWith('b')) return refused(line, `${head} is a behavioural source; a model card may hold only .model, .lib/.endl and .param statements`);
  if (/^[a-z]/.test(word)) return refused(line, `${head} is a circuit element (an instance line); a model card may hold only .model, .lib/.endl and .param statements`);
  return refused(line, `${head} is not a statement of a model card (.model, .lib/.endl, .param)`);
}

function refused(line: number, reason: string): ModelCardError {
  return new ModelCardError('MODEL_CARD_REFUSED', line, reason);
}

function invalid(line: number, reason: string): ModelCardError {
  return new ModelCardError('MODEL_CARD_INVALID', line, reason);
}
