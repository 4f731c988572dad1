// Inline figure SVG is described once, by the labelled wrapper (role="img" + aria-label from the alt text);
// the renderer's per-mark ARIA roles would make screen readers walk hundreds of unlabelled marks.

/** The SVG markup hidden from assistive technology, with the renderer's ARIA roles and labels removed. */
export function decorativeSvg(svg: string): string {
  return svg
    .replace(/\s(?:role|aria-roledescription|aria-label|aria-labelledby|aria-describedby)="[^"]*"/g, '')
    .replace(/<svg\b/, '<svg aria-hidden="true" focusable="false"');
}
