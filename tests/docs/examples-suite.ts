/**
 * Every example in the docs runs here, so a doc comment cannot go stale: each `@example` block of
 * every source file under src/ (except *.generated.ts) and each ```ts block of README.md,
 * docs/README.md and docs/guide/*.md.
 *
 * What runs
 * - An example is TypeScript, transpiled (types stripped, not checked) and run on the source tree.
 * - A markdown block sees only what it imports: `import { … } from 'heatstate…'` resolves through
 *   entries.json to the source of that entry, as a user's import resolves to the package.
 * - An `@example` block sees every export of every entry in entries.json, plus the low-level names
 *   it uses from any module under src/ (first from its own file, then its own folder, then the
 *   entries, then the nearest other module). Anything else it needs it defines itself.
 * - Each example runs on its own: nothing carries over from one block to the next.
 *
 * What a line claims
 * - `expr; //=> value` is a check: `expr` must produce `value`. The check sits on the line that
 *   ends the statement (with its `;`); a statement may start on earlier lines.
 * - `stmt; // throws Name`, or `// throws Name` alone on the line after the statement: running the
 *   statement must throw an instance of the error class `Name` from src/errors.ts, whose `name` is
 *   `Name`. With `// throws Name: fragment`, the message must contain the fragment; a `…` (or
 *   `...`) in the fragment stands for any text, so `a … b` needs `a` and then `b`.
 * - Every other line runs as written (a plain `// comment` is a comment).
 * - After the value (or after `throws Name`) only a parenthetical comment may follow:
 *   `//=> 101.42 (kPa)`, `//=> 0 (Status.ok)`. Anything else (a second claim such as
 *   `//=> 0; out.h = …`, a `: remark`) is an error of the example: split it into checked lines.
 *
 * How a printed value is compared
 * - Strings (`'vapor'`), `true`, `false`, `undefined`, `null`: identical (===). `NaN`: is NaN.
 * - Arrays `[a, b]` and objects `{ k: a, … }`: same length, same keys (own enumerable, any order),
 *   and each element by these rules. `Uint8Array [0, 3]` (any typed-array name): an instance of
 *   that class, elements by these rules.
 * - Numbers (the actual value must be a JS number, so a Quantity needs its `.in(unit)`):
 *   - an integer, with or without exponent (`0`, `41`, `250`, `1e9`, `100e6`): exactly that number;
 *   - 16 or more significant digits (`0.7390851332151607`): exactly that double;
 *   - otherwise (`2.09`, `1004.9`, `16.529e6`, `8.94735e-3`): the actual value rounded (half up,
 *     from its shortest decimal form) to the printed number's last digit equals it, i.e. `2.09`
 *     means "2.09 at 2 decimals", `16.529e6` means "16.529e6 to the nearest 1000";
 *   - a trailing `...` or `…` (`3375.06...`, `287...`) means the printed digits begin the value:
 *     the actual rounded or truncated to the last printed digit equals it.
 *   Minus signs are ASCII `-` (a `−` is refused: the example should be copyable).
 */
import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, relative, sep } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import Decimal from 'decimal.js';
import { transformSync } from 'esbuild';
import { createRequire } from 'node:module';
import type * as TypeScript from 'typescript';
import { describe, expect, it } from 'vitest';
import { readManifest, specifier } from '../../scripts/entries.js';

// TypeScript's parser (the export index below) by require: an ES import of the CommonJS compiler
// would first have Node scan its 9 MB for export names (about 0.7 s of a core)
const ts = createRequire(import.meta.url)('typescript') as typeof TypeScript;

const root = fileURLToPath(new URL('../../', import.meta.url));
const rel = (p: string) => relative(root, p).split(sep).join('/');

// ---------------------------------------------------------------------------------------------
// Printed values

type Printed =
  | { kind: 'number'; text: string; value: Decimal; decimals: number; digits: number; exact: boolean; prefix: boolean }
  | { kind: 'literal'; text: string; value: unknown }
  | { kind: 'nan' }
  | { kind: 'array'; items: Printed[]; typed?: string }
  | { kind: 'object'; entries: [string, Printed][] };

class PrintedParser {
  i = 0;
  constructor(readonly s: string) {}
  fail(what: string): never {
    throw new Error(`cannot read the printed value ${JSON.stringify(this.s)}: ${what} at column ${this.i + 1}`);
  }
  ws() {
    while (this.i < this.s.length && /\s/.test(this.s[this.i]!)) this.i++;
  }
  eat(t: string) {
    this.ws();
    if (!this.s.startsWith(t, this.i)) this.fail(`expected ${t}`);
    this.i += t.length;
  }
  value(): Printed {
    this.ws();
    const rest = this.s.slice(this.i);
    if (rest.startsWith('−')) this.fail('a "−" (U+2212) where an ASCII minus "-" belongs');
    const num = /^-?\d+(\.\d+)?([eE][+-]?\d+)?(\.\.\.|…)?/.exec(rest);
    if (num && !/^[\w$]/.test(rest.slice(num[0].length))) {
      this.i += num[0].length;
      const prefix = num[3] !== undefined;
      const text = prefix ? num[0].slice(0, -num[3]!.length) : num[0];
      const [mantissa, exponent = '0'] = text.toLowerCase().split('e') as [string, string?];
      const fraction = mantissa.split('.')[1] ?? '';
      const digits = mantissa.replace(/^-/, '').replace('.', '').replace(/^0+/, '').length || 1;
      const integer = !mantissa.includes('.');
      return { kind: 'number', text, value: new Decimal(text), decimals: fraction.length - Number(exponent), digits, exact: !prefix && (integer || digits >= 16), prefix };
    }
    const quoted = /^'((?:[^'\\]|\\.)*)'|^"((?:[^"\\]|\\.)*)"/.exec(rest);
    if (quoted) {
      this.i += quoted[0].length;
      return { kind: 'literal', text: quoted[0], value: (quoted[1] ?? quoted[2])!.replace(/\\(.)/g, '$1') };
    }
    const word = /^[A-Za-z_$][\w$]*/.exec(rest);
    if (word) {
      this.i += word[0].length;
      const literals: Record<string, unknown> = { true: true, false: false, undefined, null: null };
      if (word[0] in literals) return { kind: 'literal', text: word[0], value: literals[word[0]] };
      if (word[0] === 'NaN') return { kind: 'nan' };
      if (/^(Uint8|Int8|Uint16|Int16|Uint32|Int32|Float32|Float64)Array$/.test(word[0])) {
        const arr = this.value();
        if (arr.kind !== 'array' || arr.typed) this.fail(`${word[0]} followed by [elements]`);
        return { ...arr, typed: word[0] };
      }
      this.fail(`${word[0]} is not a printed value`);
    }
    if (rest.startsWith('[')) {
      this.i++;
      const items: Printed[] = [];
      this.ws();
      if (this.s[this.i] === ']') return this.i++, { kind: 'array', items };
      for (;;) {
        items.push(this.value());
        this.ws();
        if (this.s[this.i] === ',') this.i++;
        else if (this.s[this.i] === ']') return this.i++, { kind: 'array', items };
        else this.fail('expected , or ]');
      }
    }
    if (rest.startsWith('{')) {
      this.i++;
      const entries: [string, Printed][] = [];
      this.ws();
      if (this.s[this.i] === '}') return this.i++, { kind: 'object', entries };
      for (;;) {
        this.ws();
        const key = /^[A-Za-z_$][\w$]*|^'[^']*'|^"[^"]*"/.exec(this.s.slice(this.i));
        if (!key) this.fail('expected a key');
        this.i += key[0].length;
        this.eat(':');
        entries.push([key[0].replace(/^['"]|['"]$/g, ''), this.value()]);
        this.ws();
        if (this.s[this.i] === ',') this.i++;
        else if (this.s[this.i] === '}') return this.i++, { kind: 'object', entries };
        else this.fail('expected , or }');
      }
    }
    return this.fail('expected a value');
  }
  /** After the value: nothing, or one parenthetical comment. */
  end() {
    this.ws();
    const rest = this.s.slice(this.i);
    if (rest !== '' && !(rest.startsWith('(') && rest.endsWith(')'))) this.fail('only a parenthetical comment may follow the value');
  }
}

/** Reads the text after `//=>`. */
function parsePrinted(text: string): Printed {
  const p = new PrintedParser(text);
  const v = p.value();
  p.end();
  return v;
}

function roundTo(x: Decimal, decimals: number, mode: Decimal.Rounding): Decimal {
  if (decimals >= 0) return x.toDecimalPlaces(decimals, mode);
  const unit = new Decimal(10).pow(-decimals);
  return x.div(unit).toDecimalPlaces(0, mode).times(unit);
}

const show = (v: unknown): string => {
  if (typeof v === 'string') return `'${v}'`;
  if (typeof v === 'number' || v === undefined || v === null || typeof v === 'boolean') return String(v);
  if (ArrayBuffer.isView(v)) return `${v.constructor.name} [${Array.from(v as unknown as ArrayLike<number>).join(', ')}]`;
  try {
    return JSON.stringify(v);
  } catch {
    return Object.prototype.toString.call(v);
  }
};

/** Why `actual` is not the printed value, or undefined when it is. */
function mismatch(actual: unknown, printed: Printed, path = ''): string | undefined {
  const at = path === '' ? '' : ` at ${path}`;
  switch (printed.kind) {
    case 'number': {
      if (typeof actual !== 'number') return `expected a number${at}, got ${show(actual)}${actual && typeof actual === 'object' ? ' (a Quantity needs .in(unit))' : ''}`;
      if (!Number.isFinite(actual)) return `expected ${printed.text}${at}, got ${actual}`;
      if (printed.exact) return actual === Number(printed.text) ? undefined : `expected exactly ${printed.text}${at}, got ${actual}`;
      const a = new Decimal(actual);
      if (roundTo(a, printed.decimals, Decimal.ROUND_HALF_UP).eq(printed.value)) return undefined;
      if (printed.prefix && roundTo(a, printed.decimals, Decimal.ROUND_DOWN).eq(printed.value)) return undefined;
      return `expected ${printed.text}${printed.prefix ? '…' : ''}${at} (to its last printed digit), got ${actual}`;
    }
    case 'nan':
      return Number.isNaN(actual) ? undefined : `expected NaN${at}, got ${show(actual)}`;
    case 'literal':
      return actual === printed.value ? undefined : `expected ${printed.text}${at}, got ${show(actual)}`;
    case 'array': {
      if (printed.typed !== undefined) {
        if (!ArrayBuffer.isView(actual) || actual.constructor.name !== printed.typed) return `expected a ${printed.typed}${at}, got ${show(actual)}`;
      } else if (!Array.isArray(actual)) return `expected an array${at}, got ${show(actual)}`;
      const items = Array.from(actual as ArrayLike<unknown>);
      if (items.length !== printed.items.length) return `expected ${printed.items.length} elements${at}, got ${items.length}: ${show(actual)}`;
      for (let k = 0; k < items.length; k++) {
        const m = mismatch(items[k], printed.items[k]!, `${path}[${k}]`);
        if (m) return m;
      }
      return undefined;
    }
    case 'object': {
      if (actual === null || typeof actual !== 'object' || Array.isArray(actual)) return `expected an object${at}, got ${show(actual)}`;
      const keys = Object.keys(actual).sort();
      const want = printed.entries.map(([k]) => k).sort();
      if (keys.join() !== want.join()) return `expected the keys ${want.join(', ')}${at}, got ${keys.join(', ')}`;
      for (const [k, v] of printed.entries) {
        const m = mismatch((actual as Record<string, unknown>)[k], v, `${path}.${k}`);
        if (m) return m;
      }
      return undefined;
    }
  }
}

/** The claim of `// throws …`. */
interface ThrowClaim {
  name: string;
  fragments: string[];
}

function parseThrows(comment: string): ThrowClaim {
  const m = /^throws\s+([A-Z]\w*)\s*(?::\s*(.*)|\(.*\))?$/.exec(comment.trim());
  if (!m || m[2]?.trim() === '') throw new Error(`cannot read "// ${comment.trim()}": write "// throws ErrorName", "// throws ErrorName (comment)" or "// throws ErrorName: message fragment"`);
  return {
    name: m[1]!,
    fragments: (m[2] ?? '')
      .split(/…|\.\.\./)
      .map((f) => f.trim())
      .filter((f) => f !== ''),
  };
}

// ---------------------------------------------------------------------------------------------
// Finding the examples

interface Example {
  /** `src/units/quantity.ts:139` */
  where: string;
  file: string;
  /** Code lines with their line numbers in the file. */
  lines: { text: string; line: number }[];
  /** Markdown blocks import what they use; @example blocks get the scope. */
  markdown: boolean;
}

function walk(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((d) => (d.isDirectory() ? walk(join(dir, d.name)) : [join(dir, d.name)]));
}

const sourceFiles = walk(join(root, 'src'))
  .filter((f) => f.endsWith('.ts'))
  .sort();

function examplesOfSource(file: string): Example[] {
  const lines = readFileSync(file, 'utf8').split('\n');
  const out: Example[] = [];
  for (let i = 0; i < lines.length; i++) {
    if (!/^\s*\*\s*@example\b/.test(lines[i]!)) continue;
    const start = i;
    const fence = lines.findIndex((l, k) => k > i && /^\s*\*\s*```ts\s*$/.test(l));
    const close = lines.findIndex((l, k) => k > fence && /^\s*\*\s*```\s*$/.test(l));
    const commentEnd = lines.findIndex((l, k) => k > i && l.includes('*/'));
    if (fence < 0 || close < 0 || close > commentEnd || lines.slice(i + 1, fence).some((l) => !/^\s*\*\s*$/.test(l))) {
      throw new Error(`${rel(file)}:${i + 1}: an @example must be a \`\`\`ts block`);
    }
    out.push({
      where: `${rel(file)}:${start + 1}`,
      file: rel(file),
      lines: lines.slice(fence + 1, close).map((l, k) => ({ text: l.replace(/^\s*\* ?/, ''), line: fence + 2 + k })),
      markdown: false,
    });
    i = close;
  }
  return out;
}

function examplesOfMarkdown(file: string): Example[] {
  const lines = readFileSync(file, 'utf8').split('\n');
  const out: Example[] = [];
  for (let i = 0; i < lines.length; i++) {
    const open = /^(\s*)```(ts|typescript)\s*$/.exec(lines[i]!);
    if (!open) continue;
    const close = lines.findIndex((l, k) => k > i && /^\s*```\s*$/.test(l));
    const indent = open[1]!.length;
    out.push({
      where: `${rel(file)}:${i + 1}`,
      file: rel(file),
      lines: lines.slice(i + 1, close).map((l, k) => ({ text: l.slice(Math.min(indent, l.length - l.trimStart().length)), line: i + 2 + k })),
      markdown: true,
    });
    i = close;
  }
  return out;
}

const markdownFiles = [join(root, 'README.md'), join(root, 'docs/README.md'), ...readdirSync(join(root, 'docs/guide')).filter((f) => f.endsWith('.md')).sort().map((f) => join(root, 'docs/guide', f))];

const examples: Example[] = [
  ...sourceFiles.filter((f) => !f.endsWith('.generated.ts')).flatMap(examplesOfSource),
  ...markdownFiles.flatMap(examplesOfMarkdown),
];

// ---------------------------------------------------------------------------------------------
// Turning an example into a program

/** Splits a line into code and `//` comment, outside string and template literals. */
function splitComment(line: string, state: { template: boolean }): { code: string; comment: string | undefined; depth: number } {
  let quote: string | undefined = state.template ? '`' : undefined;
  let depth = 0;
  for (let i = 0; i < line.length; i++) {
    const c = line[i]!;
    if (quote) {
      if (c === '\\') i++;
      else if (c === quote) quote = undefined;
      continue;
    }
    if (c === "'" || c === '"' || c === '`') quote = c;
    else if (c === '/' && line[i + 1] === '/') {
      state.template = false;
      return { code: line.slice(0, i).trimEnd(), comment: line.slice(i + 2), depth };
    } else if ('([{'.includes(c)) depth++;
    else if (')]}'.includes(c)) depth--;
  }
  state.template = quote === '`';
  return { code: line.trimEnd(), comment: undefined, depth };
}

interface Claim {
  line: number;
  source: string;
  printed?: Printed;
  throws?: ThrowClaim;
}

/** The TypeScript program of an example, with each claim turned into a call of __check or __throws. */
function program(example: Example): { code: string; claims: Claim[] } {
  const claims: Claim[] = [];
  const body: string[] = [];
  const state = { template: false };
  let pending: { text: string; line: number }[] = [];
  let depth = 0;
  let last: { index: number; statement: string; first: number; claim: boolean } | undefined;
  const fail: (line: number, why: string) => never = (line, why) => {
    throw new Error(`${example.file}:${line}: ${why}`);
  };
  const readThrows = (line: number, comment: string): ThrowClaim => {
    try {
      return parseThrows(comment);
    } catch (e) {
      return fail(line, (e as Error).message);
    }
  };
  for (const { text, line } of example.lines) {
    const inTemplate = state.template;
    const { code, comment, depth: d } = splitComment(text, state);
    const trimmed = comment?.trim() ?? '';
    const kind = trimmed.startsWith('=>') ? 'value' : /^throws\b/.test(trimmed) ? 'throws' : undefined;
    if (code.trim() === '' && !inTemplate && pending.length === 0) {
      if (kind === 'value') fail(line, '//=> without an expression on its line');
      if (kind === 'throws') {
        if (last === undefined || last.claim) throw new Error(`${example.file}:${line}: // throws must follow the statement it is about`);
        const claim: Claim = { line, source: last.statement, throws: readThrows(line, trimmed) };
        claims.push(claim);
        body.splice(last.index, 1, `__throws(${claims.length - 1}, () => { ${last.statement} });`);
        last = { ...last, claim: true };
        continue;
      }
      body.push(text);
      continue;
    }
    pending.push({ text: state.template ? text : code, line });
    depth += d;
    const complete = !state.template && depth === 0 && /;\s*$/.test(code);
    if (!complete) {
      if (kind) fail(line, `a ${kind === 'value' ? '//=>' : '// throws'} goes on the line that ends its statement (with ";")`);
      continue;
    }
    const statement = pending.map((p) => p.text).join('\n');
    const first = pending[0]!.line;
    pending = [];
    if (kind === 'value') {
      const expr = statement.replace(/;\s*$/, '');
      if (/^\s*(const|let|var|function|class|import|export|if|for|while)\b/.test(expr)) fail(line, '//=> needs an expression, not a declaration');
      let printed: Printed;
      try {
        printed = parsePrinted(trimmed.slice(2));
      } catch (e) {
        return fail(line, (e as Error).message);
      }
      claims.push({ line, source: expr.trim(), printed });
      body.push(`__check(${claims.length - 1}, () => (${expr}));`);
      last = { index: body.length - 1, statement, first, claim: true };
    } else if (kind === 'throws') {
      claims.push({ line, source: statement.trim(), throws: readThrows(line, trimmed) });
      body.push(`__throws(${claims.length - 1}, () => { ${statement} });`);
      last = { index: body.length - 1, statement, first, claim: true };
    } else {
      body.push(statement);
      last = { index: body.length - 1, statement, first, claim: false };
    }
  }
  if (pending.length > 0) body.push(pending.map((p) => p.text).join('\n'));
  return { code: body.join('\n'), claims };
}

// ---------------------------------------------------------------------------------------------
// The scope: entries and low-level modules of the source tree

type Module = Record<string, unknown>;
const manifest = readManifest();
/** The modules of the source tree that may hold an example's names (src/cli/main.ts runs the command line when imported). */
const candidates = sourceFiles.filter((f) => rel(f) !== 'src/cli/main.ts').map(rel);
/** Source modules, imported on first use (each import brings in that module's own graph only). */
const loaded = new Map<string, Promise<Module>>();
const sourceModule = (file: string): Promise<Module> => {
  let m = loaded.get(file);
  if (!m) loaded.set(file, (m = import(pathToFileURL(join(root, file)).href) as Promise<Module>));
  return m;
};

/**
 * The names a source module can export at run time, each with the file that declares it, read from
 * the module's syntax (TypeScript's parser, no type check): declarations with `export`, `export { … }`
 * lists (an imported name followed to its file), `export * as ns` and, followed through the tree,
 * `export * from`; interfaces, type aliases and `type` exports are left out. The map may hold more than
 * the module's run-time exports, never less (the 'export index' test below holds that for every module an example loaded),
 * so a module whose map lacks a name need not be imported to be passed over.
 */
const exportIndex = new Map<string, Map<string, string>>();
function exportsOf(file: string): Map<string, string> {
  const known = exportIndex.get(file);
  if (known) return known;
  const names = new Map<string, string>();
  exportIndex.set(file, names); // a cycle of `export *` ends here
  const source = ts.createSourceFile(file, readFileSync(join(root, file), 'utf8'), ts.ScriptTarget.ES2022, false, ts.ScriptKind.TS);
  const target = (specifier: string): string | undefined => {
    if (!specifier.startsWith('.')) return undefined;
    const base = join(dirname(file), specifier).split(sep).join('/');
    return [base.replace(/\.js$/, '.ts'), `${base}.ts`, `${base}/index.ts`].find((f) => candidates.includes(f));
  };
  /** Where a name of another module comes from (that module itself when it is not a source module). */
  const originIn = (specifier: string, name: string): string | undefined => {
    const t = target(specifier);
    return t ? exportsOf(t).get(name) : specifier;
  };
  const set = (name: string, origin: string | undefined) => {
    if (origin !== undefined) names.set(name, origin);
  };
  const imported = new Map<string, string>();
  for (const st of source.statements) {
    if (!ts.isImportDeclaration(st) || !ts.isStringLiteral(st.moduleSpecifier)) continue;
    const bindings = st.importClause?.namedBindings;
    if (bindings && ts.isNamedImports(bindings) && !st.importClause?.isTypeOnly) {
      for (const e of bindings.elements) {
        const origin = e.isTypeOnly ? undefined : originIn(st.moduleSpecifier.text, (e.propertyName ?? e.name).text);
        if (origin !== undefined) imported.set(e.name.text, origin);
      }
    }
  }
  /** Interfaces and type aliases declared here: no run-time value (a local `export { T }` of one exports nothing at run time). */
  const localTypes = new Set(source.statements.filter((st) => ts.isInterfaceDeclaration(st) || ts.isTypeAliasDeclaration(st)).map((st) => (st as TypeScript.InterfaceDeclaration).name.text));
  const bind = (b: TypeScript.BindingName) => {
    if (ts.isIdentifier(b)) names.set(b.text, file);
    else for (const e of b.elements) if (!ts.isOmittedExpression(e)) bind(e.name);
  };
  for (const st of source.statements) {
    if (ts.isExportDeclaration(st)) {
      const from = st.moduleSpecifier && ts.isStringLiteral(st.moduleSpecifier) ? st.moduleSpecifier.text : undefined;
      if (st.isTypeOnly) continue;
      if (st.exportClause && ts.isNamedExports(st.exportClause)) {
        for (const e of st.exportClause.elements) {
          if (e.isTypeOnly) continue;
          const local = (e.propertyName ?? e.name).text;
          set(e.name.text, from !== undefined ? originIn(from, local) : (imported.get(local) ?? (localTypes.has(local) ? undefined : file)));
        }
      } else if (st.exportClause) names.set(st.exportClause.name.text, file);
      else if (from !== undefined) {
        const t = target(from);
        if (t) for (const [n, origin] of exportsOf(t)) if (n !== 'default' && !names.has(n)) names.set(n, origin);
      }
    } else if (ts.isExportAssignment(st)) names.set('default', file);
    else if (ts.canHaveModifiers(st) && ts.getModifiers(st)?.some((m) => m.kind === ts.SyntaxKind.ExportKeyword)) {
      if (ts.getModifiers(st)?.some((m) => m.kind === ts.SyntaxKind.DefaultKeyword)) names.set('default', file);
      if (ts.isVariableStatement(st)) for (const d of st.declarationList.declarations) bind(d.name);
      else if ((ts.isFunctionDeclaration(st) || ts.isClassDeclaration(st) || ts.isEnumDeclaration(st) || ts.isModuleDeclaration(st)) && st.name && ts.isIdentifier(st.name)) names.set(st.name.text, file);
    }
  }
  return names;
}

/**
 * Set by tests/docs/examples-built.test.ts, which runs this suite: the entries' names then come from
 * the built dist/, as a user's import resolves to the published package, and only the low-level names
 * an example uses beyond the entries come from the source tree. Unset (a run of this module on its
 * own), everything comes from the source tree.
 */
const fromDist = (globalThis as { heatstateExamplesFromDist?: boolean }).heatstateExamplesFromDist === true;
const distPath = (out: string) => pathToFileURL(join(root, 'dist', `${out}.js`)).href;
const entryModules = await Promise.all(
  manifest.entries.map(async (e) => ({ specifier: specifier(e), source: e.source, module: fromDist ? ((await import(distPath(e.out))) as Module) : await sourceModule(e.source) })),
);
const byName = new Map(entryModules.map((e) => [e.specifier, e.module]));
if (fromDist) {
  it('takes every entry from the built dist/, not from the source tree', async () => {
    for (const e of manifest.entries) expect(byName.get(specifier(e)), e.subpath).toBe(await import(distPath(e.out)));
    expect(Object.keys(byName.get('heatstate')!)).toEqual(expect.arrayContaining(['water', 'quantity', 'idealGas']));
  });
}
const errors = await sourceModule('src/errors.ts');

/** Steps between two files' folders in the tree. */
function distance(from: string, to: string): number {
  const a = dirname(from).split('/');
  const b = dirname(to).split('/');
  let k = 0;
  while (k < a.length && k < b.length && a[k] === b[k]) k++;
  return a.length + b.length - 2 * k;
}

/**
 * Where each name of an `@example` comes from: its own file, then its own folder, then the entries,
 * then the nearest other module. From dist/, a name that an entry publishes is taken from the built
 * entry wherever the source tree's first match declares it (the same binding, as published), so
 * that only names no entry publishes are imported from the source tree.
 */
async function scopeFor(example: Example, names: Set<string>): Promise<Module> {
  const dir = dirname(example.file);
  const own = candidates.filter((f) => f === example.file);
  const folder = candidates.filter((f) => f !== example.file && dirname(f) === dir);
  const away = new Map(candidates.map((f) => [f, distance(f, example.file)]));
  const rest = [...candidates].sort((a, b) => away.get(a)! - away.get(b)! || a.localeCompare(b));
  type Place = { entry: (typeof entryModules)[number] } | { file: string };
  const order: Place[] = [...[...own, ...folder].map((file) => ({ file })), ...entryModules.map((entry) => ({ entry })), ...rest.map((file) => ({ file }))];
  const has = (m: Module, name: string) => Object.prototype.hasOwnProperty.call(m, name);
  const scope: Module = {};
  for (const name of names) {
    for (const place of order) {
      if ('entry' in place) {
        if (has(place.entry.module, name)) {
          scope[name] = place.entry.module[name];
          break;
        }
        continue;
      }
      const origin = exportsOf(place.file).get(name);
      if (origin === undefined) continue;
      const published = fromDist ? entryModules.find((e) => exportsOf(e.source).get(name) === origin && has(e.module, name)) : undefined;
      const m = published ? published.module : await sourceModule(place.file);
      if (has(m, name)) {
        scope[name] = m[name];
        break;
      }
    }
  }
  return scope;
}

const RESERVED = new Set('break case catch class const continue debugger default delete do else enum export extends false finally for function if import in instanceof let new null return static super switch this throw true try typeof var void while with yield await arguments eval undefined NaN Infinity'.split(' '));

interface Outcome {
  checks: number;
  failures: string[];
}

async function run(example: Example): Promise<Outcome> {
  const { code, claims } = program(example);
  // types stripped, imports turned into require() calls (esbuild: a fraction of a millisecond a block)
  const js = transformSync(code, { loader: 'ts', format: 'cjs', target: 'es2022' }).code;
  const failures: string[] = [];
  const at = (i: number) => `${example.file}:${claims[i]!.line}: ${claims[i]!.source.replace(/\s+/g, ' ')}`;
  const done = new Set<number>();
  const check = (i: number, f: () => unknown) => {
    done.add(i);
    let actual: unknown;
    try {
      actual = f();
    } catch (e) {
      failures.push(`${at(i)}\n    threw ${(e as Error).name}: ${(e as Error).message}`);
      return;
    }
    const m = mismatch(actual, claims[i]!.printed!);
    if (m) failures.push(`${at(i)}\n    ${m}`);
  };
  const throws = (i: number, f: () => void) => {
    done.add(i);
    const claim = claims[i]!.throws!;
    const cls = errors[claim.name];
    if (typeof cls !== 'function') {
      failures.push(`${at(i)}\n    ${claim.name} is not an error class of src/errors.ts`);
      return;
    }
    try {
      f();
    } catch (e) {
      const err = e as Error;
      if (!(err instanceof (cls as new () => Error)) || err.name !== claim.name) failures.push(`${at(i)}\n    expected ${claim.name}, threw ${err.name}: ${err.message}`);
      else {
        let from = 0;
        for (const fragment of claim.fragments) {
          const k = err.message.indexOf(fragment, from);
          if (k < 0) {
            failures.push(`${at(i)}\n    the message lacks "${fragment}"${from > 0 ? ' (after the previous fragment)' : ''}: ${err.message}`);
            break;
          }
          from = k + fragment.length;
        }
      }
      return;
    }
    failures.push(`${at(i)}\n    expected ${claim.name}, nothing was thrown`);
  };
  const require = (id: string) => {
    const m = byName.get(id);
    if (!m) throw new Error(`${example.where}: imports ${id}, which is not an entry of entries.json`);
    return m;
  };
  let scope: Module = {};
  if (!example.markdown) {
    const names = new Set((code.match(/[A-Za-z_$][\w$]*/g) ?? []).filter((n) => !RESERVED.has(n)));
    scope = await scopeFor(example, names);
  }
  const names = Object.keys(scope);
  try {
    // eslint-disable-next-line @typescript-eslint/no-implied-eval
    new Function('__scope', '__check', '__throws', 'require', 'exports', `const { ${names.join(', ')} } = __scope;\n{\n${js}\n}`)(scope, check, throws, require, {});
  } catch (e) {
    failures.push(`${example.where}: the example stopped with ${(e as Error).name}: ${(e as Error).message}`);
  }
  claims.forEach((_, i) => {
    if (!done.has(i) && failures.length === 0) failures.push(`${at(i)}\n    never ran`);
  });
  return { checks: claims.length, failures };
}

// ---------------------------------------------------------------------------------------------

describe('the printed-value rules', () => {
  const ok = (actual: unknown, text: string) => mismatch(actual, parsePrinted(text));
  it('integers and full-length numbers are exact', () => {
    expect(ok(250, '250')).toBeUndefined();
    expect(ok(250.00000000000003, '250')).toMatch(/exactly/);
    expect(ok(1e9, '1e9')).toBeUndefined();
    expect(ok(1.2e9, '1e9')).toMatch(/exactly/);
    expect(ok(0.7390851332151607, '0.7390851332151607')).toBeUndefined();
    expect(ok(0.7390851332151608, '0.7390851332151607')).toMatch(/exactly/);
  });
  it('other numbers round to their last printed digit', () => {
    expect(ok(2.0900000000000003, '2.09')).toBeUndefined();
    expect(ok(2.0949, '2.09')).toBeUndefined();
    expect(ok(2.095, '2.09')).toMatch(/last printed digit/);
    expect(ok(2.0849, '2.09')).toMatch(/last printed digit/);
    expect(ok(16_529_490, '16.529e6')).toBeUndefined();
    expect(ok(16_529_600, '16.529e6')).toMatch(/last printed digit/);
    expect(ok(0.00894735, '8.94735e-3')).toBeUndefined();
    expect(ok(-0.0459, '-0.046')).toBeUndefined();
    expect(ok(1.00489, '1.0061')).toMatch(/last printed digit/);
  });
  it('a trailing ... or … means the digits begin the value (rounded or truncated)', () => {
    expect(ok(3375.0578, '3375.05...')).toBeUndefined();
    expect(ok(3375.0578, '3375.06…')).toBeUndefined();
    expect(ok(3375.0678, '3375.05...')).toMatch(/last printed digit/);
    expect(ok(287.9, '287...')).toBeUndefined();
    expect(ok(288.6, '287...')).toMatch(/last printed digit/);
  });
  it('values other than numbers are identical; structures element by element', () => {
    expect(ok('vapor', "'vapor'")).toBeUndefined();
    expect(ok('liquid', "'vapor'")).toBeDefined();
    expect(ok(undefined, 'undefined (not in the list)')).toBeUndefined();
    expect(ok(Uint8Array.of(0, 0, 3), 'Uint8Array [0, 0, 3]')).toBeUndefined();
    expect(ok([0, 0, 3], 'Uint8Array [0, 0, 3]')).toBeDefined();
    expect(ok(Uint8Array.of(0, 1), 'Uint8Array [0, 0]')).toBeDefined();
    expect(ok({ N2: 0.76712, O2: 0.23288 }, '{ N2: 0.7671..., O2: 0.2329... }')).toBeUndefined();
    expect(ok({ N2: 0.76712, O2: 0.23288, Ar: 0 }, '{ N2: 0.7671..., O2: 0.2329... }')).toMatch(/keys/);
    expect(ok([['N2'], [0.79]], "[['N2'], [0.79]]")).toBeUndefined();
    expect(ok({ in: () => 1 }, '1')).toMatch(/Quantity/);
  });
  it('refuses a second claim, a remark or a typographic minus after the value', () => {
    expect(() => parsePrinted(' 0; out.h = 3375058 J/kg')).toThrow(/parenthetical/);
    expect(() => parsePrinted(' -0.046: cp frozen')).toThrow(/parenthetical/);
    expect(() => parsePrinted(' −0.046')).toThrow(/ASCII/);
    expect(() => parsePrinted(' a temperature difference, 30 Δ°F')).toThrow(/not a printed value/);
    expect(parsePrinted(' 101.42 (kPa)')).toMatchObject({ kind: 'number', text: '101.42' });
  });
  it('reads a throws claim with its message fragments', () => {
    expect(parseThrows('throws OutOfRangeError: T = 900 K is above … (800 K)')).toEqual({ name: 'OutOfRangeError', fragments: ['T = 900 K is above', '(800 K)'] });
    expect(parseThrows('throws DimensionError')).toEqual({ name: 'DimensionError', fragments: [] });
    expect(parseThrows('throws DefinitionError (naming each bad field)')).toEqual({ name: 'DefinitionError', fragments: [] });
    expect(() => parseThrows('throws: the state is vapour')).toThrow();
    expect(() => parseThrows('throws DefinitionError naming each bad field')).toThrow();
  });
});

/**
 * Claims that are right while the code is wrong: each stays listed (with why) until the code is
 * fixed. The claim must still fail, with nothing else failing in its example; once it holds, the
 * 'known code bugs' test below fails so that its entry is removed.
 */
const KNOWN_BUGS: Record<string, string> = {};

describe('every example in the docs runs and its //=> values hold', () => {
  const outcomes = new Map<string, Outcome>();
  const stillFailing = new Set<string>();
  it('finds the examples', () => {
    expect(examples.filter((e) => !e.markdown).length).toBeGreaterThan(150);
    expect(examples.filter((e) => e.markdown).length).toBeGreaterThan(3);
  });
  it.each(examples.map((e) => [`${e.where}  ${e.lines.find((l) => l.text.trim() !== '')?.text.trim() ?? ''}`, e] as const))('%s', async (_name, example) => {
    let outcome: Outcome;
    try {
      outcome = await run(example);
    } catch (e) {
      outcome = { checks: 0, failures: [(e as Error).message] };
    }
    outcomes.set(example.where, outcome);
    const failures = outcome.failures.filter((f) => {
      const known = Object.keys(KNOWN_BUGS).find((k) => f.startsWith(`${k}: `));
      if (known) stillFailing.add(known);
      return known === undefined;
    });
    expect(failures.length, `\n${failures.join('\n')}\n`).toBe(0);
  });
  it('known code bugs still fail (remove an entry of KNOWN_BUGS once its claim holds)', () => {
    expect(Object.keys(KNOWN_BUGS).filter((k) => !stillFailing.has(k))).toEqual([]);
  });
  it('counts', () => {
    const checks = [...outcomes.values()].reduce((n, o) => n + o.checks, 0);
    console.log(`doc examples: ${outcomes.size} run, ${checks} claims checked`);
    expect(checks).toBeGreaterThan(300);
  });
  it('export index: every name a loaded source module exports at run time is in the set read from its syntax', async () => {
    expect(loaded.size, 'source modules loaded').toBeGreaterThan(0);
    const missing: string[] = [];
    for (const [file, m] of loaded) for (const name of Object.keys(await m)) if (!exportsOf(file).has(name)) missing.push(`${file}: ${name}`);
    expect(missing).toEqual([]);
    // from dist/, a published name never brings in an entry's source
    if (fromDist) expect([...loaded.keys()].filter((f) => manifest.entries.some((e) => e.source === f)), 'entry sources imported').toEqual([]);
  });
});
