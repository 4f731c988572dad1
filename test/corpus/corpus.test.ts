// Bad-input corpus: every case through `check` in-process (exact lines and exit code), the ledger invariant, no crash.
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { CASES } from './cases.js';
import { EXPECTED } from './expected.js';
import { makeProject, removeProjects } from './make-project.js';
import { checkCase, ledgerBalance, runCase, valueNotes } from './run-case.js';

afterAll(() => removeProjects());

describe('check(project) on the bad-input corpus', () => {
  it('has at least 50 distinct cases, each with an expectation', () => {
    expect(new Set(CASES.map((c) => c.name)).size).toBe(CASES.length);
    expect(CASES.length).toBeGreaterThanOrEqual(50);
    expect(Object.keys(EXPECTED).sort()).toEqual(CASES.map((c) => c.name).sort());
  });

  for (const c of CASES) {
    const expected = EXPECTED[c.name];
    it(`check(${c.name}) exits ${expected.exit}${expected.todo ? '' : ' with the expected messages'}`, async () => {
      const run = await runCase(c);
      const text = run.lines.join('\n');
      expect(text).not.toContain('    at ');
      expect(text.toLowerCase()).not.toContain('internal error');
      expect(run.exit).toBe(expected.exit);
      if (!expected.todo) {
        expect(run.lines).toEqual(expected.lines);
        expect(valueNotes(run.result)).toEqual(expected.notes ?? []);
      }
      if (run.result && run.exit === 0) {
        for (const b of ledgerBalance(run.result)) expect({ file: b.file, read: b.read }).toEqual({ file: b.file, read: b.used + b.excluded });
      }
    });
    if (expected.todo) it.todo(expected.todo);
  }
});

describe('checkProject(dir) agrees with the corpus runner', () => {
  for (const name of ['ragged sample row with an extra field', 'config with a wrong type', 'lat and lon swapped onto land', 'symlink pointing outside the project']) {
    it(`checkProject(${name}) prints the expected lines`, async () => {
      const c = CASES.find((k) => k.name === name);
      expect(c && (await checkCase(c))).toEqual({ exit: EXPECTED[name].exit, lines: EXPECTED[name].lines });
    });
  }
});

describe('basinquota check DIR (real CLI)', () => {
  const bin = fileURLToPath(new URL('../../bin/basinquota.js', import.meta.url));
  const cli = (dir: string) => spawnSync(process.execPath, [bin, 'check', dir], { encoding: 'utf8' });
  const byName = (name: string) => {
    const c = CASES.find((k) => k.name === name);
    if (!c) throw new Error(`no case ${name}`);
    return c;
  };

  it('check(base project) exits 0 and ends with "check passed"', () => {
    const out = cli(makeProject());
    const lines = `${out.stdout}${out.stderr}`.trim().split('\n');
    expect({ status: out.status, last: lines[lines.length - 1] }).toEqual({ status: 0, last: 'check passed' });
    // Only counts of kept-but-converted rows precede it: the base cells take their station's position.
    expect(lines.slice(0, -1)).toEqual(['note: 18 cells rows converted (station-position); see the ledger for each row']);
  });

  it('check(semicolon samples) exits 1 with the delimiter message and no stack trace', () => {
    const out = cli(makeProject(byName('samples file with semicolon delimiter').patch));
    expect(out.status).toBe(1);
    expect(`${out.stdout}${out.stderr}`).toContain(EXPECTED['samples file with semicolon delimiter'].lines[0]);
    expect(`${out.stdout}${out.stderr}`).not.toContain('    at ');
  });

  it('check(truncated NetCDF) exits 1 without a stack trace', () => {
    const out = cli(makeProject(byName('truncated NetCDF').patch));
    expect(out.status).toBe(1);
    expect(`${out.stdout}${out.stderr}`).toContain(EXPECTED['truncated NetCDF'].lines[0]);
    expect(`${out.stdout}${out.stderr}`).not.toContain('    at ');
  });
});
