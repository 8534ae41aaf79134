// Dead-export check for `npm test`: every name exported from app/, lib/ or components/ must be
// used: imported by some other file (tests, scripts and benches count as importers) or used in
// its own file (knip's `ignoreExportsUsedInFile`: a type in an exported signature, a function
// bound into a module's `*Queries` object). Stands in for knip until package changes are free;
// it honours knip's `@public` JSDoc tag, so a deliberate export is marked the same way for
// both:  /** Why it is kept. @public */
//
// Usage: tsx scripts/check-exports.mts   (exit 1 and one line per dead export when any is found)
import path from "node:path";
import ts from "typescript";

const ROOT = path.resolve(import.meta.dirname, "..");
const CHECKED = ["app/", "lib/", "components/"].map((d) => path.join(ROOT, d));
const TEST_FILE = /\.test\.tsx?$|\/tests?\/|testUtil\.ts$/;
/** Names Next.js (or the proxy) reads from a file by convention: used without an import. */
const FRAMEWORK_NAMES = new Set([
  "default",
  "metadata",
  "generateMetadata",
  "generateStaticParams",
  "generateImageMetadata",
  "viewport",
  "generateViewport",
  "GET",
  "HEAD",
  "POST",
  "PUT",
  "PATCH",
  "DELETE",
  "OPTIONS",
  "dynamic",
  "dynamicParams",
  "revalidate",
  "fetchCache",
  "runtime",
  "preferredRegion",
  "maxDuration",
  "alt",
  "size",
  "contentType",
  "config",
  "proxy",
]);

function loadProgram(): ts.Program {
  const configPath = path.join(ROOT, "tsconfig.json");
  const read = ts.readConfigFile(configPath, ts.sys.readFile);
  const parsed = ts.parseJsonConfigFileContent(read.config, ts.sys, ROOT, { noEmit: true, incremental: false }, configPath);
  return ts.createProgram({ rootNames: parsed.fileNames, options: parsed.options });
}

/** Follows import/export aliases to the symbol that declares the value or type. */
function original(checker: ts.TypeChecker, symbol: ts.Symbol): ts.Symbol {
  return symbol.flags & ts.SymbolFlags.Alias ? checker.getAliasedSymbol(symbol) : symbol;
}

function isPublicTagged(symbol: ts.Symbol): boolean {
  return (symbol.declarations ?? []).some((d) => {
    const node = ts.isVariableDeclaration(d) ? d.parent.parent : d;
    return ts.getJSDocTags(node).some((t) => t.tagName.text === "public");
  });
}

export function findDeadExports(program: ts.Program): string[] {
  const checker = program.getTypeChecker();
  const used = new Set<ts.Symbol>();
  const wholeModules = new Set<ts.SourceFile>();
  const moduleOf = (spec: ts.Expression): ts.SourceFile | undefined => {
    const sym = checker.getSymbolAtLocation(spec);
    const decl = sym?.declarations?.[0];
    return decl && ts.isSourceFile(decl) ? decl : undefined;
  };
  const markNamed = (file: ts.SourceFile | undefined, names: string[]) => {
    if (!file) return;
    const moduleSymbol = checker.getSymbolAtLocation(file);
    if (!moduleSymbol) return;
    for (const exp of checker.getExportsOfModule(moduleSymbol)) if (names.includes(exp.name)) used.add(original(checker, exp));
  };

  for (const sf of program.getSourceFiles()) {
    if (sf.isDeclarationFile && sf.fileName.includes("node_modules")) continue;
    const visit = (node: ts.Node): void => {
      if (ts.isImportDeclaration(node) || (ts.isExportDeclaration(node) && node.moduleSpecifier)) {
        const target = moduleOf(node.moduleSpecifier!);
        if (ts.isImportDeclaration(node)) {
          const clause = node.importClause;
          if (clause?.name) markNamed(target, ["default"]);
          const bindings = clause?.namedBindings;
          if (bindings && ts.isNamespaceImport(bindings) && target) wholeModules.add(target);
          if (bindings && ts.isNamedImports(bindings))
            markNamed(
              target,
              bindings.elements.map((e) => (e.propertyName ?? e.name).text),
            );
        } else {
          // A re-export (`export { x } from`, `export * from`) is not a use by itself: the
          // hub's export aliases the original symbol, which the hub's importers mark.
          const clause = (node as ts.ExportDeclaration).exportClause;
          if (clause && ts.isNamespaceExport(clause) && target) wholeModules.add(target);
        }
      }
      // await import("…"): destructured names, or the whole module when the result is kept whole.
      if (ts.isCallExpression(node) && node.expression.kind === ts.SyntaxKind.ImportKeyword && node.arguments[0]) {
        const target = moduleOf(node.arguments[0]);
        let parent = node.parent;
        while (parent && (ts.isAwaitExpression(parent) || ts.isParenthesizedExpression(parent))) parent = parent.parent;
        if (parent && ts.isVariableDeclaration(parent) && ts.isObjectBindingPattern(parent.name)) {
          markNamed(
            target,
            parent.name.elements.map((e) => ((e.propertyName ?? e.name) as ts.Identifier).text),
          );
        } else if (target) wholeModules.add(target);
      }
      // import("…").Name in type positions
      if (ts.isImportTypeNode(node) && node.qualifier && ts.isLiteralTypeNode(node.argument) && ts.isStringLiteral(node.argument.literal)) {
        const sym = checker.getSymbolAtLocation(node.qualifier);
        if (sym) used.add(original(checker, sym));
      }
      ts.forEachChild(node, visit);
    };
    visit(sf);
  }

  /** Symbols referenced in a file other than at their own declaration. */
  const usedInFile = (sf: ts.SourceFile): Set<ts.Symbol> => {
    const seen = new Set<ts.Symbol>();
    const visit = (node: ts.Node): void => {
      if (ts.isIdentifier(node)) {
        const parent = node.parent;
        const isDeclarationName = parent && (parent as ts.NamedDeclaration).name === node && !ts.isShorthandPropertyAssignment(parent);
        const isExportSpecifier = parent && ts.isExportSpecifier(parent);
        if (!isDeclarationName && !isExportSpecifier) {
          const sym = ts.isShorthandPropertyAssignment(parent)
            ? checker.getShorthandAssignmentValueSymbol(parent)
            : checker.getSymbolAtLocation(node);
          if (sym) seen.add(original(checker, sym));
        }
      }
      ts.forEachChild(node, visit);
    };
    visit(sf);
    return seen;
  };

  const dead: string[] = [];
  for (const sf of program.getSourceFiles()) {
    const file = sf.fileName;
    if (sf.isDeclarationFile || !CHECKED.some((d) => file.startsWith(d)) || TEST_FILE.test(file) || wholeModules.has(sf)) continue;
    const moduleSymbol = checker.getSymbolAtLocation(sf);
    if (!moduleSymbol) continue;
    let local: Set<ts.Symbol> | undefined;
    for (const exp of checker.getExportsOfModule(moduleSymbol)) {
      if (FRAMEWORK_NAMES.has(exp.name)) continue;
      const target = original(checker, exp);
      // A re-export's own file is not where the name lives: judge it at its declaration.
      const declaredHere = (target.declarations ?? []).some((d) => d.getSourceFile() === sf);
      if (!declaredHere || used.has(target) || isPublicTagged(target)) continue;
      if ((local ??= usedInFile(sf)).has(target)) continue;
      const decl = target.declarations![0]!;
      const { line } = sf.getLineAndCharacterOfPosition(decl.getStart());
      dead.push(`${path.relative(ROOT, file)}:${line + 1}  ${exp.name}`);
    }
  }
  return dead.sort();
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const dead = findDeadExports(loadProgram());
  if (dead.length) {
    console.error(
      `${dead.length} exported name(s) that nothing imports (delete them, stop exporting them, or mark a deliberate one /** … @public */):`,
    );
    for (const d of dead) console.error("  " + d);
    process.exit(1);
  }
  console.log("exports: every exported name is imported somewhere");
}
