// Small helpers for hand-assembled SVG: escaping and a width estimate when no font measure is supplied.

/** XML-escaped text for element content and attribute values. */
export function escapeXml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

/** Text width in px: `measure` when given, else 0.6 em per character (DejaVu Sans averages about 0.6 em). */
export function textWidth(text: string, fontSize: number, measure?: (text: string, fontSize: number) => number): number {
  return measure ? measure(text, fontSize) : 0.6 * fontSize * text.length;
}
