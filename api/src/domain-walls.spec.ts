import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, relative, resolve, sep } from 'node:path';
import * as ts from 'typescript';

/**
 * The walls between the API's folders (DEVELOPERS.md, "Layout and walls"), read from the source:
 * - no import cycle between top-level folders of api/src (a domain that needs something of one that
 *   depends on it declares a port the other fills, or listens to its event);
 * - no new `@InjectRepository` of another folder's entity: a domain asks the owner through its service or a
 *   read model. The allowlist below holds the injections that remain; it may only shrink.
 * The root files (app.module, main, worker, app.setup) compose everything and are left out.
 */

const SRC = __dirname;

/**
 * Foreign repository injections still to be replaced, as `file: Entity`. Remove a line when its injection goes;
 * a line whose injection is gone fails the test, so the list cannot keep dead entries.
 */
const FOREIGN_REPOSITORY_ALLOWLIST = [
  'admin/admin.service.ts: User',
  'admin/admin.service.ts: Workshop',
  'admin/admin.service.ts: WorkshopMember',
  'assemblies/assemblies.service.ts: PartFeature',
  'auth/session.service.ts: User',
  'follows/follows.service.ts: Assembly',
  'follows/follows.service.ts: Build',
  'follows/follows.service.ts: FitReport',
  'follows/follows.service.ts: Guide',
  'follows/follows.service.ts: Workshop',
  'follows/follows.service.ts: WorkshopMember',
  'follows/mail-preferences.service.ts: User',
  'follows/mail-preferences.service.ts: Workshop',
  'guide-revisions/guide-revisions.service.ts: FitCheck',
  'guide-revisions/guide-revisions.service.ts: FitCheckEvent',
  'guide-revisions/guide-revisions.service.ts: Guide',
  'guide-revisions/guide-revisions.service.ts: GuideRevision',
  'guide-revisions/guide-revisions.service.ts: Workshop',
  'guides/guides.service.ts: Assembly',
  'guides/guides.service.ts: Footage',
  'guides/guides.service.ts: Mark',
  'guides/guides.service.ts: User',
  'guides/guides.service.ts: Workshop',
  'guides/published-guides.service.ts: Build',
  'guides/published-guides.service.ts: Footage',
  'guides/published-guides.service.ts: Mark',
  'guides/published-guides.service.ts: Measurement',
  'guides/published-guides.service.ts: Transcript',
  'guides/published-guides.service.ts: User',
  'guides/published-guides.service.ts: Workshop',
  'workshops/invitations.service.ts: User',
  'workshops/members.service.ts: User',
];

/** Cycles between folders that remain, each as its folders in sorted order. May only shrink. */
const KNOWN_CYCLES: string[][] = [['auth', 'workshops']];

interface SourceFile {
  /** Path from api/src, with forward slashes. */
  path: string;
  folder: string;
  ast: ts.SourceFile;
}

function sourceFiles(root: string): SourceFile[] {
  const found: SourceFile[] = [];
  const walk = (dir: string) => {
    for (const entry of readdirSync(dir, { withFileTypes: true })) {
      const full = join(dir, entry.name);
      if (entry.isDirectory()) walk(full);
      else if (entry.name.endsWith('.ts') && !entry.name.endsWith('.spec.ts') && !entry.name.endsWith('.d.ts')) {
        const path = relative(root, full).split(sep).join('/');
        if (!path.includes('/')) continue; // a composition root
        found.push({ path, folder: path.split('/')[0], ast: ts.createSourceFile(path, readFileSync(full, 'utf8'), ts.ScriptTarget.Latest, false) });
      }
    }
  };
  walk(root);
  return found;
}

/** The top-level folder a relative module specifier of `file` lands in, or null for a package or a root file. */
function folderOf(root: string, file: string, specifier: string): string | null {
  if (!specifier.startsWith('.')) return null;
  const target = relative(root, resolve(root, dirname(file), specifier)).split(sep);
  return target.length > 1 && target[0] !== '..' ? target[0] : null;
}

/** Every module specifier a file names: imports, re-exports, `import()` and `import x = require()`. */
function specifiersOf(ast: ts.SourceFile): string[] {
  const found: string[] = [];
  const visit = (node: ts.Node) => {
    if ((ts.isImportDeclaration(node) || ts.isExportDeclaration(node)) && node.moduleSpecifier && ts.isStringLiteral(node.moduleSpecifier)) {
      found.push(node.moduleSpecifier.text);
    } else if (ts.isCallExpression(node) && node.expression.kind === ts.SyntaxKind.ImportKeyword && node.arguments[0] && ts.isStringLiteral(node.arguments[0])) {
      found.push(node.arguments[0].text);
    } else if (ts.isExternalModuleReference(node) && ts.isStringLiteral(node.expression)) {
      found.push(node.expression.text);
    }
    ts.forEachChild(node, visit);
  };
  visit(ast);
  return found;
}

type Edges = Map<string, Map<string, string[]>>;

export function folderEdges(root: string, files: SourceFile[]): Edges {
  const edges: Edges = new Map();
  for (const file of files) {
    for (const specifier of specifiersOf(file.ast)) {
      const to = folderOf(root, file.path, specifier);
      if (!to || to === file.folder) continue;
      const from = edges.get(file.folder) ?? new Map<string, string[]>();
      from.set(to, [...(from.get(to) ?? []), `${file.path} → ${specifier}`]);
      edges.set(file.folder, from);
    }
  }
  return edges;
}

/** Strongly connected groups of two or more folders (Tarjan), each sorted: every one is a cycle. */
export function cyclesOf(edges: Map<string, Iterable<string>>): string[][] {
  let next = 0;
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const onStack = new Set<string>();
  const groups: string[][] = [];
  const connect = (node: string) => {
    index.set(node, next);
    low.set(node, next);
    next += 1;
    stack.push(node);
    onStack.add(node);
    for (const to of edges.get(node) ?? []) {
      if (!index.has(to)) {
        connect(to);
        low.set(node, Math.min(low.get(node)!, low.get(to)!));
      } else if (onStack.has(to)) low.set(node, Math.min(low.get(node)!, index.get(to)!));
    }
    if (low.get(node) === index.get(node)) {
      const group: string[] = [];
      let member: string;
      do {
        member = stack.pop()!;
        onStack.delete(member);
        group.push(member);
      } while (member !== node);
      if (group.length > 1) groups.push(group.sort());
    }
  };
  for (const node of edges.keys()) if (!index.has(node)) connect(node);
  return groups.sort((a, b) => a.join().localeCompare(b.join()));
}

/** `file: Entity` for each `@InjectRepository(Entity)` whose entity is imported from another top-level folder. */
export function foreignRepositoryInjections(root: string, files: SourceFile[]): string[] {
  const found: string[] = [];
  for (const file of files) {
    const importedFrom = new Map<string, string>();
    for (const statement of file.ast.statements) {
      if (!ts.isImportDeclaration(statement) || !ts.isStringLiteral(statement.moduleSpecifier)) continue;
      const bindings = statement.importClause?.namedBindings;
      if (bindings && ts.isNamedImports(bindings)) for (const element of bindings.elements) importedFrom.set(element.name.text, statement.moduleSpecifier.text);
    }
    const visit = (node: ts.Node) => {
      if (ts.isCallExpression(node) && ts.isIdentifier(node.expression) && node.expression.text === 'InjectRepository') {
        const entity = node.arguments[0];
        const specifier = entity && ts.isIdentifier(entity) ? importedFrom.get(entity.text) : undefined;
        const owner = specifier ? folderOf(root, file.path, specifier) : null;
        if (owner && owner !== file.folder) found.push(`${file.path}: ${(entity as ts.Identifier).text}`);
      }
      ts.forEachChild(node, visit);
    };
    visit(file.ast);
  }
  return found.sort();
}

describe('walls between the API folders', () => {
  const files = sourceFiles(SRC);

  it('finds a cycle and a foreign injection when there is one (fixtures)', () => {
    const edges = new Map([
      ['marks', ['fit-checks', 'parts']],
      ['fit-checks', ['assemblies']],
      ['assemblies', ['marks']],
      ['parts', []],
    ]);
    expect(cyclesOf(edges)).toEqual([['assemblies', 'fit-checks', 'marks']]);
    expect(cyclesOf(new Map([['marks', ['parts']], ['parts', []]]))).toEqual([]);

    const fixture = (path: string, text: string): SourceFile => ({ path, folder: path.split('/')[0], ast: ts.createSourceFile(path, text, ts.ScriptTarget.Latest, false) });
    const service = fixture(
      'marks/fixture.service.ts',
      [
        "import { Mark } from './entities/mark.entity';",
        "import { Guide } from '../guides/entities/guide.entity';",
        "import { FitChecksService } from '../fit-checks/fit-checks.service';",
        'class S { constructor(@InjectRepository(Mark) a: unknown, @InjectRepository(Guide) b: unknown, c: FitChecksService) {} }',
      ].join('\n'),
    );
    expect(foreignRepositoryInjections(SRC, [service])).toEqual(['marks/fixture.service.ts: Guide']);
    expect([...(folderEdges(SRC, [service]).get('marks')?.keys() ?? [])]).toEqual(['guides', 'fit-checks']);
  });

  it('has no import cycle between folders beyond the known ones', () => {
    const edges = folderEdges(SRC, files);
    const cycles = cyclesOf(new Map([...edges].map(([from, to]) => [from, [...to.keys()]])));
    const explain = (group: string[]) =>
      `${group.join(' ↔ ')}:\n` +
      group
        .flatMap((from) => group.flatMap((to) => edges.get(from)?.get(to) ?? []))
        .map((line) => `  ${line}`)
        .join('\n');
    const known = new Set(KNOWN_CYCLES.map((group) => group.join()));
    const unexpected = cycles.filter((group) => !known.has(group.join()));
    expect(unexpected.map(explain)).toEqual([]);
    // A known cycle that is gone must leave the list.
    expect(KNOWN_CYCLES.filter((group) => !cycles.some((found) => found.join() === group.join()))).toEqual([]);
  });

  it('injects no other folder’s repository beyond the shrinking allowlist', () => {
    const found = foreignRepositoryInjections(SRC, files);
    expect(found.filter((line) => !FOREIGN_REPOSITORY_ALLOWLIST.includes(line))).toEqual([]);
    expect(FOREIGN_REPOSITORY_ALLOWLIST.filter((line) => !found.includes(line))).toEqual([]);
  });
});
