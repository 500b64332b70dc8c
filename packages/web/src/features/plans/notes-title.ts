const normalised = (text: string) =>
  text
    .replace(/[#*_`]/g, '')
    .replace(/[\s:.!-]+$/, '')
    .trim()
    .toLowerCase();

/**
 * Notes without a first heading that only repeats the title of the panel they are shown in
 * ("# Safety notes" inside the panel already headed "Safety notes"). Any other first heading stays.
 */
export function withoutRepeatedTitle(markdown: string, titles: readonly string[]): string {
  const wanted = new Set(titles.map(normalised));
  const atx = /^\s*#{1,6}[ \t]+([^\n]*?)[ \t#]*(?:\n|$)/.exec(markdown);
  if (atx && wanted.has(normalised(atx[1]!))) return markdown.slice(atx[0].length).replace(/^\s*\n/, '');
  const setext = /^\s*([^\n]+)\n[ \t]*(?:=+|-+)[ \t]*(?:\n|$)/.exec(markdown);
  if (setext && wanted.has(normalised(setext[1]!))) return markdown.slice(setext[0].length).replace(/^\s*\n/, '');
  return markdown;
}
