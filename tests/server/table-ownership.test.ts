/**
 * Every table has one owner, and only the owner's files import its schema symbols (the table, its
 * row types, its constants). Another feature reads through the owner's `<owner>.reads.ts` and
 * writes by publishing a domain event the owner reacts to. The one exception: `users` may be
 * imported anywhere to join names onto lists, but rows of users are written only in server/accounts/.
 */
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';

const ROOT = path.resolve(import.meta.dirname, '../..');
const SCHEMA_DIR = 'server/db/schema';

/** Table symbol → the one folder whose files may import it. A new table must be given a line here. */
const TABLE_OWNERS: Record<string, string> = {
  users: 'server/accounts',
  accountTokens: 'server/accounts',
  badges: 'server/accounts',
  tools: 'server/features/tools',
  loans: 'server/features/tools',
  holds: 'server/features/tools',
  toolEvents: 'server/features/tools',
  missingAccessories: 'server/features/tools',
  photos: 'server/features/tools',
  signoffs: 'server/features/tools',
  memberSignoffs: 'server/features/tools',
  signoffRequests: 'server/features/tools',
  loanReminders: 'server/features/tools',
  bins: 'server/features/stock',
  stockSlips: 'server/features/stock',
  stockMovements: 'server/features/stock',
  memberPayments: 'server/features/stock',
  paymentRefunds: 'server/features/stock',
  builds: 'server/features/planning',
  assemblies: 'server/features/planning',
  binAlerts: 'server/features/planning',
  onlinePayments: 'server/features/payments',
  outboxMail: 'server/mail',
  caughtMail: 'server/mail',
  settings: 'server/settings',
  jobRuns: 'server/jobs',
  idempotencyKeys: 'server/features/idempotency',
  sessions: 'server/session',
  stations: 'server/features/stations',
  stationPinFailures: 'server/features/stations',
};

/** Tables any server file may import to read (names on lists); writes stay in the owner. */
const READ_ANYWHERE = new Set(['users']);

/** The composition point that hands every schema to Drizzle: it may import them all. */
const SCHEMA_COMPOSER = 'server/db/client.ts';


const parse = (file: string, text = readFileSync(path.join(ROOT, file), 'utf8')) => ts.createSourceFile(file, text, ts.ScriptTarget.Latest, true);
const isExported = (node: ts.Node) => ts.canHaveModifiers(node) && (ts.getModifiers(node) ?? []).some((m) => m.kind === ts.SyntaxKind.ExportKeyword);

function serverFiles(dir = 'server'): string[] {
  return readdirSync(path.join(ROOT, dir), { withFileTypes: true }).flatMap((entry) => {
    const rel = `${dir}/${entry.name}`;
    if (entry.isDirectory()) return serverFiles(rel);
    return entry.name.endsWith('.ts') ? [rel] : [];
  });
}

interface SchemaSymbol {
  /** The schema module, e.g. `stock` for server/db/schema/stock.ts. */
  module: string;
  name: string;
  table: boolean;
  /** The tables it belongs to: a table itself, the table a row type is made from, else all the module's tables. */
  tables: string[];
  owners: Set<string>;
}

/** Every symbol each schema module exports, tables told apart from the rest (row types, constants, re-exports). */
function schemaSymbols(): SchemaSymbol[] {
  return readdirSync(path.join(ROOT, SCHEMA_DIR))
    .filter((f) => f.endsWith('.ts'))
    .flatMap((f) => {
      const module = f.replace(/\.ts$/, '');
      const source = parse(`${SCHEMA_DIR}/${f}`);
      const found: { name: string; table: boolean; node: ts.Node }[] = [];
      for (const statement of source.statements) {
        if (ts.isVariableStatement(statement) && isExported(statement)) {
          for (const d of statement.declarationList.declarations) {
            const table = !!d.initializer && ts.isCallExpression(d.initializer) && d.initializer.expression.getText(source) === 'sqliteTable';
            found.push({ name: d.name.getText(source), table, node: d });
          }
        } else if ((ts.isTypeAliasDeclaration(statement) || ts.isInterfaceDeclaration(statement) || ts.isFunctionDeclaration(statement)) && isExported(statement) && statement.name) {
          found.push({ name: statement.name.text, table: false, node: statement });
        } else if (ts.isExportDeclaration(statement) && statement.exportClause && ts.isNamedExports(statement.exportClause)) {
          for (const e of statement.exportClause.elements) found.push({ name: e.name.text, table: false, node: e });
        }
      }
      const tables = found.filter((s) => s.table).map((s) => s.name);
      const ownerOf = (names: string[]) => new Set(names.flatMap((n) => (TABLE_OWNERS[n] ? [TABLE_OWNERS[n]] : [])));
      return found.map(({ name, table, node }): SchemaSymbol => {
        const named = table ? [name] : tables.filter((t) => new RegExp(`\\b${t}\\b`).test(node.getText(source)));
        const of = named.length > 0 ? named : tables;
        return { module, name, table, tables: of, owners: ownerOf(of) };
      });
    });
}

interface SchemaImport {
  module: string;
  /** The symbols named, or `*` for a namespace import. */
  names: string[];
}

/** The schema module an import or export statement of the file reads from (`stock` for db/schema/stock), if any. */
function schemaModuleOf(file: string, statement: ts.Statement): string | null {
  const specifier = (ts.isImportDeclaration(statement) || ts.isExportDeclaration(statement)) && statement.moduleSpecifier && ts.isStringLiteral(statement.moduleSpecifier) ? statement.moduleSpecifier.text : null;
  if (!specifier?.startsWith('.')) return null;
  const target = path.relative(ROOT, path.resolve(path.dirname(path.join(ROOT, file)), specifier)).split(path.sep).join('/');
  return path.posix.dirname(target) === SCHEMA_DIR ? path.posix.basename(target).replace(/\.ts$/, '') : null;
}

/** The db/schema modules a file imports or re-exports from, with the symbols it names. */
function schemaImportsOf(file: string, source: ts.SourceFile): SchemaImport[] {
  const out: SchemaImport[] = [];
  for (const statement of source.statements) {
    const module = schemaModuleOf(file, statement);
    if (module === null || !(ts.isImportDeclaration(statement) || ts.isExportDeclaration(statement))) continue;
    const names: string[] = [];
    if (ts.isImportDeclaration(statement)) {
      const bindings = statement.importClause?.namedBindings;
      if (bindings && ts.isNamespaceImport(bindings)) names.push('*');
      if (bindings && ts.isNamedImports(bindings)) names.push(...bindings.elements.map((e) => (e.propertyName ?? e.name).text));
      if (statement.importClause?.name) names.push('*');
    } else if (statement.exportClause && ts.isNamedExports(statement.exportClause)) {
      names.push(...statement.exportClause.elements.map((e) => (e.propertyName ?? e.name).text));
    } else {
      names.push('*');
    }
    out.push({ module, names });
  }
  return out;
}

interface Breach {
  file: string;
  symbol: string;
  owner: string;
}

const inside = (file: string, folder: string) => file.startsWith(`${folder}/`);

/** Where a file imports a schema symbol of a table it does not own. */
function breachesIn(file: string, source: ts.SourceFile, symbols: SchemaSymbol[]): Breach[] {
  if (inside(file, SCHEMA_DIR) || file === SCHEMA_COMPOSER) return [];
  return schemaImportsOf(file, source).flatMap(({ module, names }) =>
    names.flatMap((name): Breach[] => {
      const wanted = symbols.filter((s) => s.module === module && (name === '*' || s.name === name));
      return wanted.flatMap((s) => {
        if (s.tables.every((t) => READ_ANYWHERE.has(t))) return [];
        const owner = [...s.owners][0] ?? 'no owner';
        return inside(file, owner) ? [] : [{ file, symbol: `${module}.${s.name}`, owner }];
      });
    }),
  );
}

/** The local names a file gives the users table (normally just `users`). */
function usersBindings(file: string, source: ts.SourceFile): Set<string> {
  const names = new Set<string>();
  for (const statement of source.statements) {
    if (!ts.isImportDeclaration(statement) || schemaModuleOf(file, statement) !== 'users') continue;
    const bindings = statement.importClause?.namedBindings;
    if (bindings && ts.isNamedImports(bindings)) for (const e of bindings.elements) if ((e.propertyName ?? e.name).text === 'users') names.add(e.name.text);
  }
  return names;
}

const RAW_USERS_WRITE = /\b(insert\s+(or\s+\w+\s+)?into|update|delete\s+from)\s+["`']?users\b/i;

/** Writes of users rows: `.insert(users)`, `.update(users)`, `.delete(users)`, or raw SQL that writes the table. */
function usersWritesIn(file: string, source: ts.SourceFile): string[] {
  const bound = usersBindings(file, source);
  const found: string[] = [];
  const visit = (node: ts.Node) => {
    if (ts.isCallExpression(node) && ts.isPropertyAccessExpression(node.expression) && ['insert', 'update', 'delete'].includes(node.expression.name.text)) {
      const arg = node.arguments[0];
      if (arg && ts.isIdentifier(arg) && bound.has(arg.text)) found.push(`${file}: .${node.expression.name.text}(${arg.text})`);
    }
    if ((ts.isNoSubstitutionTemplateLiteral(node) || ts.isTemplateHead(node) || ts.isStringLiteral(node)) && RAW_USERS_WRITE.test(node.text)) found.push(`${file}: raw SQL "${node.text.trim().slice(0, 40)}"`);
    ts.forEachChild(node, visit);
  };
  visit(source);
  return found;
}

const symbols = schemaSymbols();
const files = serverFiles();
const breaches = files.flatMap((file) => breachesIn(file, parse(file), symbols));
const described = (b: Breach) => `${b.file} imports ${b.symbol}, owned by ${b.owner}/`;

describe('table ownership', () => {
  it('gives every table in db/schema exactly one owner, and every other schema symbol the owner of its table', () => {
    const tables = symbols.filter((s) => s.table).map((s) => s.name);
    expect(tables.filter((t) => !(t in TABLE_OWNERS)), 'tables without an owner in TABLE_OWNERS').toEqual([]);
    expect(Object.keys(TABLE_OWNERS).filter((t) => !tables.includes(t)), 'owners of tables db/schema no longer has').toEqual([]);
    expect(symbols.filter((s) => s.owners.size !== 1).map((s) => `${s.module}.${s.name}`), 'schema symbols whose owner is not one folder').toEqual([]);
  });

  it('names owners that are folders of the server', () => {
    const folders = new Set(files.map((f) => path.posix.dirname(f)));
    expect(Object.values(TABLE_OWNERS).filter((owner) => ![...folders].some((f) => f === owner || inside(f, owner)))).toEqual([]);
  });

  it('imports a table only inside its owner: another feature reads through <owner>.reads.ts', () => {
    expect(breaches.map(described)).toEqual([]);
  });

  it('writes rows of users only in server/accounts/', () => {
    const writes = files.filter((f) => !inside(f, 'server/accounts')).flatMap((f) => usersWritesIn(f, parse(f)));
    expect(writes).toEqual([]);
  });

  it('finds a breach when a feature imports a table it does not own, and lets the owner and users reads through', () => {
    const planning = 'server/features/planning/example.ts';
    const text = [
      "import { bins, type BinRow } from '../../db/schema/stock';",
      "import { assemblies } from '../../db/schema/builds';",
      "import { users } from '../../db/schema/users';",
      "import * as tools from '../../db/schema/tools';",
    ].join('\n');
    const found = breachesIn(planning, parse(planning, text), symbols).map(described);
    expect(found).toContain('server/features/planning/example.ts imports stock.bins, owned by server/features/stock/');
    expect(found).toContain('server/features/planning/example.ts imports stock.BinRow, owned by server/features/stock/');
    expect(found).toContain('server/features/planning/example.ts imports tools.holds, owned by server/features/tools/');
    expect(found.filter((f) => f.includes('builds.') || f.includes('users.'))).toEqual([]);
  });

  it('finds a write of users outside server/accounts/, however the table is named locally', () => {
    const file = 'server/features/people/example.ts';
    const text = [
      "import { users as people } from '../../db/schema/users';",
      'export const a = (db) => db.update(people).set({ active: false });',
      'export const b = (db) => db.select().from(people);',
      "export const c = (db) => db.run(sql`update users set active = 0`);",
    ].join('\n');
    expect(usersWritesIn(file, parse(file, text))).toEqual([`${file}: .update(people)`, `${file}: raw SQL "update users set active = 0"`]);
  });
});
