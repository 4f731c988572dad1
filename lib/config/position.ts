// Find the line and column of a key path inside a parsed YAML document.
import { isMap, isScalar, isSeq, LineCounter, type Document, type Node } from 'yaml';

/** 1-based line and column of the node at `path` (or of its nearest existing ancestor; the key for a missing child). */
export function positionOf(doc: Document, lines: LineCounter, path: readonly PropertyKey[], preferKey = false): { line: number; col: number } {
  let node: unknown = doc.contents;
  let offset = (doc.contents as Node | null)?.range?.[0] ?? 0;
  for (const part of path) {
    if (isMap(node)) {
      const pair = node.items.find((p) => (isScalar(p.key) ? p.key.value : p.key) === part);
      if (!pair) break;
      const keyNode = pair.key as Node | null;
      const valueNode = pair.value as Node | null;
      offset = (preferKey || !valueNode?.range ? keyNode?.range?.[0] : valueNode.range[0]) ?? offset;
      node = valueNode;
    } else if (isSeq(node) && typeof part === 'number') {
      const item = node.items[part] as Node | undefined;
      if (!item) break;
      offset = item.range?.[0] ?? offset;
      node = item;
    } else break;
  }
  const pos = lines.linePos(offset);
  return { line: pos.line, col: pos.col };
}

export { LineCounter };
