import type { DatasetVariable, NetcdfDataset } from './dataset.js';
import { textAttribute } from './dataset.js';
import { variableAmbiguous, variableNotFound, variableNotNamed } from './messages.js';

function isCoordinate(v: DatasetVariable): boolean {
  return v.dims.length === 1 && v.dims[0] === v.name;
}

/** Picks the data variable by name, else by CF standard_name (CF Conventions 1.10 §3.3); coordinate variables never match a standard_name. */
export function findDataVariable(dataset: NetcdfDataset, choice: { variable?: string; standardName?: string }): DatasetVariable {
  const available = dataset.variables.map((v) => ({ name: v.name, standardName: textAttribute(v.attributes, 'standard_name') }));
  if (choice.variable !== undefined) {
    const found = dataset.variables.find((v) => v.name === choice.variable);
    if (!found) throw new Error(variableNotFound(dataset.name, `named "${choice.variable}"`, available));
    return found;
  }
  if (choice.standardName === undefined) throw new Error(variableNotNamed(dataset.name));
  const matches = dataset.variables.filter((v) => !isCoordinate(v) && textAttribute(v.attributes, 'standard_name') === choice.standardName);
  if (matches.length === 0) throw new Error(variableNotFound(dataset.name, `with standard_name "${choice.standardName}"`, available));
  if (matches.length > 1) throw new Error(variableAmbiguous(dataset.name, choice.standardName, matches.map((v) => v.name)));
  return matches[0];
}
