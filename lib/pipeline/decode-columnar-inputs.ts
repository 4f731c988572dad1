// Parquet and Arrow decoding is asynchronous; it runs once before the synchronous stages.
import { decodeColumnar, isColumnarFile } from '../load/index.js';
import type { Problem } from '../types.js';
import type { ProjectInputs } from './project-inputs.js';

/** Decode every columnar samples/cells file of the project into `inputs.columnar`; returns the files that did not decode. */
export async function decodeColumnarInputs(inputs: ProjectInputs): Promise<Problem[]> {
  const problems: Problem[] = [];
  const columnar = new Map(inputs.columnar ?? []);
  for (const entry of [...inputs.config.inputs.samples, ...inputs.config.inputs.cells]) {
    const bytes = inputs.files.get(entry.path);
    if (!bytes || !isColumnarFile(entry.path) || columnar.has(entry.path)) continue;
    const decoded = await decodeColumnar(bytes);
    if ('severity' in decoded) problems.push(decoded);
    else columnar.set(entry.path, decoded);
  }
  inputs.columnar = columnar;
  return problems;
}
