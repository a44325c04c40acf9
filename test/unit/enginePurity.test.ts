// The engine runs in a worker and in Node: it must not touch React, the store, plotly or the DOM.
import { describe, expect, it } from 'vitest';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';

const FORBIDDEN_IMPORT = /from\s+['"](react|react-dom|zustand|plotly\.js[^'"]*|plotly-impl)['"/]/;
const FORBIDDEN_GLOBAL = /\b(document|window|localStorage|sessionStorage|navigator)\s*\./;

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((f) => {
    const p = join(dir, f);
    return statSync(p).isDirectory() ? files(p) : p.endsWith('.ts') ? [p] : [];
  });
}

describe('src/engine purity', () => {
  const engineFiles = files('src/engine');
  it('has engine files to check', () => expect(engineFiles.length).toBeGreaterThan(5));
  it.each(engineFiles)('%s imports no UI library and uses no DOM global', (file) => {
    const code = readFileSync(file, 'utf8').replace(/\/\/.*$/gm, '').replace(/\/\*[\s\S]*?\*\//g, '');
    expect(code).not.toMatch(FORBIDDEN_IMPORT);
    expect(code).not.toMatch(FORBIDDEN_GLOBAL);
  });
});
