// The numbers of one table row, read from a package's text in content order (pdfjs gives table
// cells one after the other, row by row), which lets a test read the cells of one row even when
// the layout wrapped them over several lines. Pass the raw page texts joined by form feeds.
/**
 * The numbers printed in one row of a titled table: the text from the row's id to the next
 * row's id (a line broken after a hyphen is joined again, page headers and footers left out),
 * every number in order.
 */
export function rowNumbers(raw: string, tableTitle: string, rowId: string, nextId: string): number[] {
  // page furniture (the running header with the status, the footer with "page N of M") can fall
  // between two rows of a table that continues on the next page
  raw = raw
    .split('\n')
    .filter((line) => !/\bpage \d+ of \d+\b/.test(line) && !/DRAFT FOR REVIEW\s*$/.test(line))
    .join('\n');
  const t0 = raw.indexOf(tableTitle);
  if (t0 < 0) throw new Error(`no table "${tableTitle}"`);
  // the table's number, "Table 9.3 <title>"; the region runs over the pages the table continues on
  // (where its title row is repeated) and ends at the next table's title (a page starts with a form feed)
  const number = /Table (\S+)\s+$/.exec(raw.slice(Math.max(0, t0 - 40), t0))?.[1];
  if (!number) throw new Error(`table "${tableTitle}" has no number before its title`);
  const after = raw.slice(t0 + tableTitle.length);
  const end = after.search(new RegExp(`\\n\\f?Table (?!${number.replace('.', '\\.')} )`));
  const region = (end >= 0 ? after.slice(0, end) : after).split(`Table ${number} ${tableTitle}`).join('').replace(/([-@])\n/g, '$1');
  const a = region.indexOf(rowId);
  if (a < 0) throw new Error(`no row ${rowId} in table "${tableTitle}"`);
  const b = region.indexOf(nextId, a + rowId.length);
  const segment = region.slice(a + rowId.length, b > a ? b : undefined);
  // a number in engineering notation, "23.39 × 10⁶", is one number
  return [...segment.matchAll(/(-?\d+(?:\.\d+)?)(?: × 10([⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+))?/g)].map((m) => Number(m[1]) * 10 ** superscriptNumber(m[2] ?? '⁰'));
}

function superscriptNumber(s: string): number {
  return Number([...s].map((c) => '⁰¹²³⁴⁵⁶⁷⁸⁹'.indexOf(c) >= 0 ? String('⁰¹²³⁴⁵⁶⁷⁸⁹'.indexOf(c)) : c === '⁻' ? '-' : c).join(''));
}
