// A section of a Markdown file between <!-- name --> and <!-- /name --> markers.
export function markedSection(text: string, name: string): string {
  const start = text.indexOf(`<!-- ${name} -->`);
  const end = text.indexOf(`<!-- /${name} -->`);
  if (start < 0 || end < start) throw new Error(`markers <!-- ${name} --> not found`);
  return text.slice(start + `<!-- ${name} -->`.length, end).trim();
}

export function replaceMarked(text: string, name: string, body: string): string {
  const start = text.indexOf(`<!-- ${name} -->`);
  const end = text.indexOf(`<!-- /${name} -->`);
  if (start < 0 || end < start) throw new Error(`markers <!-- ${name} --> not found`);
  return `${text.slice(0, start)}<!-- ${name} -->\n${body}\n${text.slice(end)}`;
}
