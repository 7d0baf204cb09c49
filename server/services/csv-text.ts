// CSV text for downloads that people open in spreadsheets: a header row, then one line per row.
// Reference: RFC 4180 (CSV: CRLF line ends, fields with comma, quote or line break quoted, quotes doubled).
import Papa from 'papaparse';

/**
 * WARNING: `escapeFormulae` prefixes a ' to cells starting with = + - @ (and tab or carriage return) so a
 * spreadsheet shows them as text rather than running them as formulas — common practice for CSV meant for
 * spreadsheets; names come from imports and people, so they are not trusted.
 */
export function csvText(columns: readonly string[], rows: readonly (readonly string[])[]): string {
  const body = Papa.unparse({ fields: [...columns], data: rows.map((r) => [...r]) }, {
    newline: '\r\n', escapeFormulae: true, quotes: false,
  });
  return `${body}\r\n`;
}
