// A plan name as a file name: letters, digits, dot, dash and underscore only, never empty.
export function safeFileName(name: string, extension: string): string {
  const base = name.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 80) || 'plan';
  return `${base}.${extension}`;
}
