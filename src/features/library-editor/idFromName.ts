// A library id from a name: lower-case letters and digits joined by single hyphens ("My tool steel" -> "my-tool-steel").
const MAX_ID_CHARS = 80;

export function idFromName(name: string): string {
  return name
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, MAX_ID_CHARS)
    .replace(/-+$/, '');
}
