// Read basinquota.yaml text into a validated Config, or into problems that name line, column and key path.
import { LineCounter, parseDocument } from 'yaml';
import type { z } from 'zod';
import type { Problem } from '../types.js';
import { formatPath } from './format-path.js';
import * as msg from './messages.js';
import { positionOf } from './position.js';
import { configSchema, type Config } from './schema.js';
import { checkConfigSemantics, type SemanticHooks } from './check-semantics.js';

/** Result of reading a config: the config when valid, and every problem found. */
export interface ParsedConfig {
  /** Validated config with defaults filled in; undefined when any error was found. */
  config?: Config;
  /** Errors and warnings, in file order. */
  problems: Problem[];
}

/** Largest number of YAML alias expansions accepted (guards against alias bombs). */
export const MAX_YAML_ALIASES = 100;

/** Parse and validate basinquota.yaml text; never throws for bad input. */
export function parseConfig(file: string, text: string, hooks: SemanticHooks = {}): ParsedConfig {
  const lines = new LineCounter();
  const doc = parseDocument(text, { lineCounter: lines, prettyErrors: false, uniqueKeys: true });
  const problems: Problem[] = [];
  const problem = (line: number, col: number, message: string): void => {
    problems.push({ file, line, col, message, severity: 'error' });
  };
  for (const error of doc.errors) {
    const pos = error.linePos?.[0] ?? lines.linePos(error.pos[0]);
    problem(pos.line, pos.col, msg.yamlSyntax(error.message.split('\n')[0]));
  }
  if (problems.length) return { problems };
  let data: unknown;
  try {
    data = doc.toJS({ maxAliasCount: MAX_YAML_ALIASES });
  } catch (error) {
    problem(1, 1, msg.yamlSyntax(error instanceof Error ? error.message : String(error)));
    return { problems };
  }
  if (data === null || typeof data !== 'object' || Array.isArray(data)) {
    problem(1, 1, msg.notAMapping());
    return { problems };
  }
  const parsed = configSchema.safeParse(data);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      for (const { path, message, atKey } of describeIssue(issue, data)) {
        const pos = positionOf(doc, lines, path, atKey);
        problem(pos.line, pos.col, `${formatPath(path)}: ${message}`);
      }
    }
    return { problems: sortProblems(problems) };
  }
  for (const found of checkConfigSemantics(parsed.data, hooks)) {
    const pos = positionOf(doc, lines, found.path, found.atKey ?? false);
    problem(pos.line, pos.col, `${formatPath(found.path)}: ${found.message}`);
  }
  if (problems.length) return { problems: sortProblems(problems) };
  return { config: parsed.data, problems };
}

function sortProblems(problems: Problem[]): Problem[] {
  return problems.sort((a, b) => a.line - b.line || a.col - b.col);
}

/** Turn one zod issue into located messages in our own words. */
function describeIssue(issue: z.core.$ZodIssue, data: unknown): { path: PropertyKey[]; message: string; atKey: boolean }[] {
  const path = [...issue.path];
  switch (issue.code) {
    case 'unrecognized_keys':
      return issue.keys.map((key) => ({ path: [...path, key], message: msg.unknownKey(key, knownKeys(path)), atKey: true }));
    case 'invalid_type': {
      const value = valueAt(data, path);
      if (value === undefined) return [{ path, message: msg.missingKey(String(path[path.length - 1] ?? '')), atKey: true }];
      return [{ path, message: msg.wrongType(issue.expected, describeValue(value)), atKey: false }];
    }
    case 'invalid_value':
      return [{ path, message: `expected one of: ${issue.values.map((v) => JSON.stringify(v)).join(', ')}; got ${describeValue(valueAt(data, path))}`, atKey: false }];
    case 'invalid_key': {
      const key = String(path[path.length - 1] ?? '');
      return [{ path, message: msg.badKey(key, formatPath(path.slice(0, -1))), atKey: true }];
    }
    case 'invalid_union': {
      const value = valueAt(data, path);
      return [{ path, message: `${describeValue(value)} is not a valid setting here (see the schema description of ${formatPath(path) || 'this key'})`, atKey: false }];
    }
    default:
      return [{ path, message: issue.message, atKey: false }];
  }
}

function valueAt(data: unknown, path: readonly PropertyKey[]): unknown {
  let node: unknown = data;
  for (const part of path) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<PropertyKey, unknown>)[part];
  }
  return node;
}

function describeValue(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'a list';
  if (typeof value === 'object') return 'a mapping';
  if (typeof value === 'string') return `"${value}"`;
  return `${typeof value} ${String(value)}`;
}

/** Keys the schema allows at an object path (for "expected one of" hints). */
function knownKeys(path: readonly PropertyKey[]): string[] {
  let schema: unknown = configSchema;
  for (const part of path) {
    schema = unwrap(schema);
    const def = (schema as { def?: { type?: string; shape?: Record<string, unknown>; element?: unknown } }).def;
    if (def?.type === 'object' && typeof part === 'string') schema = def.shape?.[part];
    else if (def?.type === 'array' && typeof part === 'number') schema = def.element;
    else if (def?.type === 'record') schema = (def as { valueType?: unknown }).valueType;
    else return [];
  }
  schema = unwrap(schema);
  const def = (schema as { def?: { type?: string; shape?: Record<string, unknown> } }).def;
  return def?.type === 'object' && def.shape ? Object.keys(def.shape) : [];
}

function unwrap(schema: unknown): unknown {
  let s = schema as { def?: { type?: string; innerType?: unknown; options?: unknown[] } } | undefined;
  while (s?.def && (s.def.type === 'default' || s.def.type === 'optional' || s.def.type === 'union')) {
    if (s.def.type === 'union') {
      const obj = (s.def.options ?? []).find((o) => (o as { def?: { type?: string } }).def?.type === 'object');
      if (!obj) break;
      s = obj as typeof s;
    } else s = s.def.innerType as typeof s;
  }
  return s;
}
