/** Format a key path as `inputs.samples[0].units.dissolved_fe`. */
export function formatPath(path: readonly PropertyKey[]): string {
  let out = '';
  for (const part of path) {
    if (typeof part === 'number') out += `[${part}]`;
    else out += (out ? '.' : '') + String(part);
  }
  return out;
}
