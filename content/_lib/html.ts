// HTML built from tagged templates: every interpolated value is escaped unless wrapped in raw().

/** Markup that is already safe (built by `html` or escaped). */
export class SafeHtml {
  constructor(readonly value: string) {}
  toString(): string {
    return this.value;
  }
}

/** Escape text for HTML element content and double-quoted attributes. */
export function escapeHtml(text: string): string {
  return text.replaceAll('&', '&amp;').replaceAll('<', '&lt;').replaceAll('>', '&gt;').replaceAll('"', '&quot;').replaceAll("'", '&#39;');
}

/** Mark trusted markup (SVG the renderer produced, MathML from temml) as safe. */
export function raw(markup: string): SafeHtml {
  return new SafeHtml(markup);
}

type Value = SafeHtml | string | number | null | undefined | false | readonly Value[];

function render(value: Value): string {
  if (value === null || value === undefined || value === false) return '';
  if (value instanceof SafeHtml) return value.value;
  if (Array.isArray(value)) return value.map(render).join('');
  return escapeHtml(String(value));
}

/** Tagged template: `html\`<td>${name}</td>\`` escapes `name`; arrays are joined; SafeHtml passes through. */
export function html(strings: TemplateStringsArray, ...values: Value[]): SafeHtml {
  let out = strings[0];
  for (let i = 0; i < values.length; i++) out += render(values[i]) + strings[i + 1];
  return new SafeHtml(out);
}
