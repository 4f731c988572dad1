import { describe, expect, it } from 'vitest';
import { parseConfig } from '../../lib/config/index.js';

const VALID = `report:
  title: Example synthesis
  authors: [A. Author, B. Author]
inputs:
  samples:
    - path: data/bottles.csv
      columns: { dissolved_fe: dFe_nM }
      units: { dissolved_fe: nmol/kg }
      flags: woce
  cells:
    - path: data/cells.csv
      cruise: X1
classes:
  diatom:
    carbon: biovolume-diatom
    aliases: [Bacillariophyceae]
`;

const located = (text: string) =>
  parseConfig('basinquota.yaml', text, { validateUnit: (_q, unit) => (unit === 'nmol/kgg' ? `unknown unit "${unit}"` : null) }).problems.map(
    (p) => `${p.file}:${p.line}:${p.col} ${p.message}`,
  );

describe('parseConfig', () => {
  it('parseConfig(valid) fills the documented defaults', () => {
    const { config, problems } = parseConfig('basinquota.yaml', VALID);
    expect(problems).toEqual([]);
    expect(config?.harmonise.detection_limit_policy).toBe('half');
    expect(config?.carbon.redfield_c_p).toBe(106); // Redfield (1963) C:P
    expect(config?.fits.bootstrap).toEqual({ n: 1000, seed: 1 });
    expect(config?.inputs.regions).toBe('builtin-basins');
  });

  it('parseConfig(unknown unit) names line, column and key path', () => {
    expect(located(VALID.replace('units: { dissolved_fe: nmol/kg }', 'units: { dissolved_fe: nmol/kgg }'))).toEqual([
      'basinquota.yaml:8:30 inputs.samples[0].units.dissolved_fe: unknown unit "nmol/kgg"',
    ]);
  });

  it('parseConfig(unknown key) lists the keys expected there', () => {
    expect(located(VALID.replace('      flags: woce\n', '      flags: woce\n      colour: red\n'))).toEqual([
      'basinquota.yaml:10:7 inputs.samples[0].colour: unknown key "colour" (expected one of: path, cruise, delimiter, columns, units, flags, detection_limits, fill_values)',
    ]);
  });

  it('parseConfig(wrong type) says what was expected', () => {
    expect(located(`${VALID}fits:\n  bootstrap: { n: many }\n`)).toEqual(['basinquota.yaml:18:19 fits.bootstrap.n: expected number, got "many"']);
  });

  it('parseConfig(missing required key) points at the enclosing key', () => {
    expect(located(VALID.replace('  title: Example synthesis\n', ''))).toEqual(['basinquota.yaml:1:1 report.title: missing required key "title"']);
  });

  it('parseConfig(path outside the project) is an error', () => {
    expect(located(VALID.replace('path: data/cells.csv', 'path: ../elsewhere/cells.csv'))).toEqual([
      'basinquota.yaml:11:13 inputs.cells[0].path: path "../elsewhere/cells.csv" leaves the project folder; inputs must lie inside it',
    ]);
  });

  it('parseConfig(absolute path) is an error', () => {
    expect(located(VALID.replace('path: data/cells.csv', 'path: /data/cells.csv'))).toEqual([
      'basinquota.yaml:11:13 inputs.cells[0].path: path "/data/cells.csv" is absolute; write it relative to the project folder',
    ]);
  });

  it('parseConfig(bad enum value) lists the allowed values', () => {
    expect(located(VALID.replace('carbon: biovolume-diatom', 'carbon: guess'))).toEqual([
      'basinquota.yaml:15:13 classes.diatom.carbon: expected one of: "measured", "biovolume-diatom", "biovolume-protist", "biovolume-factor", "phosphorus"; got "guess"',
    ]);
  });

  it('parseConfig(YAML syntax error) reports where the parser stopped', () => {
    const problems = located(VALID.replace('authors: [A. Author, B. Author]', 'authors: [A. Author, B. Author'));
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatch(/^basinquota\.yaml:\d+:\d+ YAML syntax error: /);
  });

  it('parseConfig(duplicate key) is a syntax error, not a silent overwrite', () => {
    const problems = located(VALID.replace('  title: Example synthesis\n', '  title: Example synthesis\n  title: Again\n'));
    expect(problems[0]).toMatch(/^basinquota\.yaml:3:3 YAML syntax error: Map keys must be unique/);
  });

  it('parseConfig(alias bomb) is refused', () => {
    const bomb = ['a: &a [x, x, x, x, x, x, x, x, x, x]', 'b: &b [*a, *a, *a, *a, *a, *a, *a, *a, *a, *a]', 'c: &c [*b, *b, *b, *b, *b, *b, *b, *b, *b, *b]', 'd: [*c, *c, *c, *c, *c, *c, *c, *c, *c, *c]'].join('\n');
    const problems = located(`${bomb}\n`);
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatch(/^basinquota\.yaml:1:1 YAML syntax error: .*alias/i);
  });

  it('parseConfig(alias claimed by two classes) is an error', () => {
    expect(located(`${VALID}  dinoflagellate:\n    carbon: biovolume-protist\n    aliases: [bacillariophyceae]\n`)).toEqual([
      'basinquota.yaml:19:14 classes.dinoflagellate.aliases: class alias "bacillariophyceae" is declared by both "diatom" and "dinoflagellate"',
    ]);
  });

  it('parseConfig(unknown canonical column) names the table', () => {
    expect(located(VALID.replace('columns: { dissolved_fe: dFe_nM }', 'columns: { dfe: dFe_nM }'))).toEqual([
      'basinquota.yaml:7:18 inputs.samples[0].columns.dfe: unknown sample column "dfe" (see the canonical names in the documentation)',
    ]);
  });

  it('parseConfig(class id with capitals) explains the naming rule', () => {
    expect(located(VALID.replace('  diatom:\n', '  Diatom:\n'))).toEqual([
      'basinquota.yaml:14:3 classes.Diatom: "Diatom" is not a valid name under classes: use lower-case letters, digits, "_" or "-", starting with a letter (put other spellings in aliases)',
    ]);
  });

  it('parseConfig(a list where a mapping is expected) says so', () => {
    expect(located('- just\n- a list\n')).toEqual(['basinquota.yaml:1:1 expected a mapping of settings (report, inputs, classes …) at the top level']);
  });
});
