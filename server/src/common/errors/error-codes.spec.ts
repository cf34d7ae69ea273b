import { ERROR_CODES } from '@channelwright/shared/schemas';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';

const repo = join(__dirname, '..', '..', '..', '..');
const listFile = join('shared', 'src', 'schemas', 'error-codes.ts');

function sourcesUnder(folder: string): string[] {
  return readdirSync(join(repo, folder), { recursive: true, withFileTypes: true })
    .filter((entry) => entry.isFile() && /\.tsx?$/.test(entry.name) && !/\.(spec|test)\.tsx?$/.test(entry.name))
    .map((entry) => join(entry.parentPath, entry.name))
    .filter((path) => !path.endsWith(listFile));
}

describe('the one list of error codes', () => {
  it('holds only codes the server or the engine actually give (a listed code nobody throws is a stale promise to clients)', () => {
    const text = [...sourcesUnder('server/src'), ...sourcesUnder('shared/src')].map((path) => readFileSync(path, 'utf8')).join('\n');
    const unused = ERROR_CODES.filter((code) => !text.includes(`'${code}'`));
    expect(unused).toEqual([]);
  });

  it('has each code once', () => {
    expect(new Set(ERROR_CODES).size).toBe(ERROR_CODES.length);
  });
});
