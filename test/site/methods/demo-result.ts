// The demo project's pipeline result, run once per test file, and reruns with an edited config.
import { join } from 'node:path';
import { readProject } from '../../../lib/cli/read-project.js';
import type { Config } from '../../../lib/config/index.js';
import { runPipeline, type PipelineResult } from '../../../lib/pipeline/index.js';
import { REPO_ROOT } from '../../helpers/run-cli.js';

/** Run the demo pipeline, after `edit` changes a copy of its config. */
export async function demoResult(edit: (config: Config) => void = () => {}): Promise<{ result: PipelineResult; config: Config }> {
  const project = await readProject(join(REPO_ROOT, 'data/demo'));
  const inputs = project.inputs!;
  const config = structuredClone(inputs.config);
  edit(config);
  return { result: runPipeline({ ...inputs, config }), config };
}
