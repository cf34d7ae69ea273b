import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';

// The server's shape as DEVELOPERS.md promises it, checked on the source itself (common practice, no source).
const SRC = __dirname;
/** Folders that are infrastructure, not features: they own no table and may be used by every feature. */
const INFRASTRUCTURE = new Set(['common', 'config', 'database']);

interface SourceFile {
  path: string;
  /** The first folder under src/, or '' for a file directly in src/. */
  folder: string;
  text: string;
}

const files: SourceFile[] = readdirSync(SRC, { recursive: true, withFileTypes: true })
  .filter((entry) => entry.isFile() && entry.name.endsWith('.ts') && !entry.name.endsWith('.spec.ts'))
  .map((entry) => {
    const path = relative(SRC, join(entry.parentPath, entry.name));
    return { path, folder: path.includes('/') ? path.split('/')[0] : '', text: readFileSync(join(SRC, path), 'utf8') };
  });
const features = [...new Set(files.map((f) => f.folder))].filter((folder) => folder !== '' && !INFRASTRUCTURE.has(folder)).sort();

/** Relative imports of a file, resolved to paths under src/ (without the .js suffix). */
function importsOf(file: SourceFile): string[] {
  return [...file.text.matchAll(/(?:import|export)\s[^;]*?from\s+'(\.{1,2}\/[^']+)'/g)].map((match) =>
    relative(SRC, resolve(SRC, dirname(file.path), match[1])).replace(/\.js$/, ''),
  );
}

/** Every @Entity class with its file. */
const entities = files.flatMap((file) =>
  [...file.text.matchAll(/@Entity\([^)]*\)\s*(?:@[^\n]+\s*)*export class (\w+)/g)].map((match) => ({ name: match[1], file })),
);

describe('the server architecture', () => {
  it('has a feature folder per module, each with its <folder>.module.ts', () => {
    expect(features.length).toBeGreaterThan(10);
    const missing = features.filter((folder) => !files.some((f) => f.path === `${folder}/${folder}.module.ts`));
    expect(missing).toEqual([]);
  });

  it('lets no class outside the database module reach the DataSource (features go through their repositories and UnitOfWork)', () => {
    const offenders = files
      .filter((file) => file.folder !== 'database')
      .filter((file) => /\b(InjectDataSource|InjectEntityManager|DataSource)\b/.test(file.text))
      .map((file) => file.path);
    expect(offenders).toEqual([]);
  });

  it('registers each entity with TypeOrmModule.forFeature in exactly one module, the one of its own folder', () => {
    expect(entities.length).toBeGreaterThan(10);
    const registrations = files.flatMap((file) =>
      [...file.text.matchAll(/TypeOrmModule\.forFeature\(\[([^\]]*)\]\)/g)].flatMap((match) =>
        match[1].split(',').map((name) => ({ entity: name.trim(), module: file.path })).filter((r) => r.entity !== ''),
      ),
    );
    const byEntity = Object.fromEntries(entities.map((e) => [e.name, registrations.filter((r) => r.entity === e.name).map((r) => r.module)]));
    const expected = Object.fromEntries(entities.map((e) => [e.name, [`${e.file.folder}/${e.file.folder}.module.ts`]]));
    expect(byEntity).toEqual(expected);
  });

  it('lets no module import another module\'s entity: other modules\' rows come through its exported services', () => {
    const entityFiles = new Map(entities.map((e) => [e.file.path.replace(/\.ts$/, ''), e.file.folder]));
    const offenders = files.flatMap((file) =>
      importsOf(file)
        .filter((target) => entityFiles.has(target) && entityFiles.get(target) !== file.folder)
        .map((target) => `${file.path} → ${target}`),
    );
    expect(offenders).toEqual([]);
  });

  it('keeps the feature modules free of import cycles (a lower module is told by registered providers, never imports the higher one)', () => {
    const edges = new Map(features.map((folder) => [folder, new Set<string>()]));
    for (const file of files.filter((f) => edges.has(f.folder))) {
      for (const target of importsOf(file)) {
        const targetFolder = target.split('/')[0];
        if (targetFolder !== file.folder && edges.has(targetFolder)) edges.get(file.folder)!.add(targetFolder);
      }
    }
    const cycles: string[] = [];
    const visit = (folder: string, path: string[]) => {
      if (path.includes(folder)) {
        cycles.push([...path.slice(path.indexOf(folder)), folder].join(' → '));
        return;
      }
      for (const next of edges.get(folder)!) visit(next, [...path, folder]);
    };
    for (const folder of features) visit(folder, []);
    expect([...new Set(cycles)]).toEqual([]);
  });
});
