// RFC 4180 reduced to its quote-free case: records are physical lines, fields are split on the delimiter.
import type { RecordStream } from './table-from-records.js';

/**
 * Records of a delimited text that contains no quote character. With no quotes, RFC 4180 records are exactly the
 * lines between CRLF, LF or CR breaks, and fields exactly the pieces between delimiters; empty lines are skipped
 * but counted, as csv-parse does with `skip_empty_lines`. The stream splits each line only when visited, so no
 * per-row arrays outlive their row. Returns null when the shortcut does not apply (a quote character, a delimiter
 * that is not one plain character, or a line longer than `maxLength`): the caller then uses the full parser, which
 * also reports the over-long record.
 */
export function splitQuoteFree(text: string, delimiter: string, maxLength: number): RecordStream | null {
  if (delimiter.length !== 1 || delimiter === '"' || delimiter === '\r' || delimiter === '\n') return null;
  if (text.includes('"')) return null;
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  return body.includes('\r') ? fromLines(body.split(/\r\n?|\n/), delimiter, maxLength) : fromLineFeeds(body, delimiter, maxLength);
}

/** Any mix of line breaks: the lines are materialised once (the rarer case). */
function fromLines(lines: string[], delimiter: string, maxLength: number): RecordStream | null {
  let first = -1;
  for (let i = 0; i < lines.length; i++) {
    if (lines[i].length > maxLength) return null;
    if (first < 0 && lines[i] !== '') first = i;
  }
  if (first < 0) return null;
  return {
    header: lines[first].split(delimiter),
    size: lines.length,
    forEach(visit) {
      for (let i = first + 1; i < lines.length; i++) if (lines[i] !== '') visit(lines[i].split(delimiter), i + 1);
    },
  };
}

/** LF breaks only: walk the text with indexOf, slicing one line at a time. */
function fromLineFeeds(body: string, delimiter: string, maxLength: number): RecordStream | null {
  const n = body.length;
  let headerStart = -1;
  let headerEnd = -1;
  let headerLine = 0;
  let line = 0;
  for (let start = 0; start <= n; ) {
    let end = body.indexOf('\n', start);
    if (end < 0) end = n;
    line++;
    if (end - start > maxLength) return null;
    if (headerStart < 0 && end > start) {
      headerStart = start;
      headerEnd = end;
      headerLine = line;
    }
    start = end + 1;
  }
  if (headerStart < 0) return null;
  return {
    header: body.slice(headerStart, headerEnd).split(delimiter),
    size: line,
    forEach(visit) {
      let at = headerLine;
      for (let start = headerEnd + 1; start <= n; ) {
        let end = body.indexOf('\n', start);
        if (end < 0) end = n;
        at++;
        if (end > start) visit(body.slice(start, end).split(delimiter), at);
        start = end + 1;
      }
    },
  };
}
