import { describe, expect, it } from '@jest/globals';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import ts from 'typescript';

const SDK = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

/**
 * What the README's fragments take from the surrounding program (a client, an id, your own
 * functions); each is declared only for a fragment that does not declare or import it itself.
 */
const CONTEXT: Record<string, string> = {
  Pourgate: "import { Pourgate } from '@pourgate/sdk';",
  PourgateProblem: "import { PourgateProblem } from '@pourgate/sdk';",
  pg: "declare const pg: import('@pourgate/sdk').Pourgate;",
  batchId: 'declare const batchId: string;',
  id: 'declare const id: string;',
  savedCursor: 'declare const savedCursor: string | undefined;',
  handle: "declare function handle(event: import('@pourgate/sdk').PourgateEvent): void;",
  save: 'declare function save(cursor: string | undefined): void;',
  readStableNetMassFromScale: 'declare function readStableNetMassFromScale(expectedGrams: number): Promise<number>;',
};

function blocks(markdown: string): string[] {
  return [...markdown.matchAll(/```ts\n([\s\S]*?)```/g)].map((m) => m[1]!);
}

function withContext(code: string): string {
  const declared = (name: string) => new RegExp(`(const|let|function|class)\\s+${name}\\b|import\\s*\\{[^}]*\\b${name}\\b[^}]*\\}`).test(code);
  const used = (name: string) => new RegExp(`\\b${name}\\b`).test(code);
  const head = Object.entries(CONTEXT).filter(([name]) => used(name) && !declared(name)).map(([, line]) => line);
  return `${head.join('\n')}\n${code}\nexport {};\n`;
}

describe('sdk/README.md', () => {
  it('every TypeScript example compiles against the SDK as published (its generated types)', () => {
    const examples = blocks(fs.readFileSync(path.join(SDK, 'README.md'), 'utf8'));
    expect(examples.length).toBeGreaterThanOrEqual(4);
    // inside sdk/, so '@pourgate/sdk' resolves through the workspace link like a user's import
    const dir = fs.mkdtempSync(path.join(SDK, '.readme-'));
    try {
      const files = examples.map((code, i) => {
        const file = path.join(dir, `example-${i + 1}.ts`);
        fs.writeFileSync(file, withContext(code));
        return file;
      });
      const program = ts.createProgram(files, {
        target: ts.ScriptTarget.ES2022,
        module: ts.ModuleKind.NodeNext,
        moduleResolution: ts.ModuleResolutionKind.NodeNext,
        lib: ['lib.es2023.d.ts'],
        types: ['node'],
        strict: true,
        noEmit: true,
        skipLibCheck: true,
      });
      const problems = ts.getPreEmitDiagnostics(program).map((d) => {
        const where = d.file && d.start !== undefined ? `${path.basename(d.file.fileName)}:${d.file.getLineAndCharacterOfPosition(d.start).line + 1} ` : '';
        return where + ts.flattenDiagnosticMessageText(d.messageText, '\n');
      });
      expect(problems).toEqual([]);
    } finally {
      fs.rmSync(dir, { recursive: true, force: true });
    }
  }, 120_000);
});
