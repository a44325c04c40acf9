// The plan link codec: document -> fragment -> document unchanged, and every tampered-link case.
import { describe, expect, it } from 'vitest';
import { decodePlanLink, encodePlanLink, MAX_PLAN_LINK_CHARS, PLAN_LINK_KEY } from '@/schema/planLink';
import { planFileToText } from '@/schema/planFileToText';
import { MAX_PLAN_BYTES } from '@/schema/parsePlan';
import { demoDocument } from './demoDocument';

/** RFC 4648 Sec. 5 base64url without padding, written independently of the codec under test. */
const base64Url = (bytes: Uint8Array) => btoa(Array.from(bytes, (b) => String.fromCharCode(b)).join('')).replace(/\+/g, '-').replace(/\//g, '_').replace(/=+$/, '');

async function deflateToFragment(bytes: Uint8Array): Promise<string> {
  const deflated = new Uint8Array(await new Response(new Blob([bytes as BlobPart]).stream().pipeThrough(new CompressionStream('deflate-raw'))).arrayBuffer());
  return PLAN_LINK_KEY + base64Url(deflated);
}
const textFragment = (text: string) => deflateToFragment(new TextEncoder().encode(text));

async function issuesOf(fragment: string) {
  const out = await decodePlanLink(fragment);
  if (out.ok) throw new Error(`expected the link ${fragment.slice(0, 80)}... to be refused, it was accepted`);
  return out.issues;
}

describe('plan link round trip', () => {
  it('document -> link -> document is unchanged, variants and sheet block included', async () => {
    const link = await encodePlanLink(demoDocument);
    expect(link.ok).toBe(true);
    if (!link.ok) return;
    expect(link.fragment.startsWith(PLAN_LINK_KEY)).toBe(true);
    expect(link.fragment).toMatch(/^plan=[A-Za-z0-9_-]+$/);
    const back = await decodePlanLink(`#${link.fragment}`);
    expect(back.ok, JSON.stringify(!back.ok && back.issues)).toBe(true);
    if (back.ok) expect(back.document).toEqual(demoDocument);
  });

  it('is compressed: the link is shorter than the file text it carries', async () => {
    const link = await encodePlanLink(demoDocument);
    const fileChars = planFileToText(demoDocument).length;
    if (!link.ok) throw new Error('encode failed');
    // Deflate takes repetitive JSON to well under half its size; base64 adds a third back.
    expect(link.fragment.length, `link ${link.fragment.length} chars, file ${fileChars} chars`).toBeLessThan(fileChars * 0.6);
  });

  it('a plan too large for a link is refused with advice to save a file', async () => {
    const huge = structuredClone(demoDocument);
    // Pseudo-random notes (a linear congruential sequence) do not compress, so the link is far over the cap.
    let seed = 12345;
    const noise = () => Array.from({ length: 900 }, () => ((seed = (seed * 1103515245 + 12345) % 2 ** 31), (seed >> 8) % 36).toString(36)).join('');
    huge.main = { ...huge.main, stages: Array.from({ length: 50 }, (_, i) => ({ ...huge.main.stages[0], name: `s${i}`, note: noise() })) };
    huge.variants = Array.from({ length: 5 }, (_, i) => ({ id: `v${i}`, name: `v${i}`, plan: huge.main }));
    const out = await encodePlanLink(huge);
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.issues[0].message).toMatch(/too large for a link.*save it as a file/);
  });
});

describe('tampered links are refused and say why', () => {
  it('no plan key, no data', async () => {
    expect((await issuesOf('#view=sheet'))[0].message).toMatch(/does not carry a plan/);
    expect((await issuesOf('#plan='))[0].message).toMatch(/no plan data/);
  });

  it('characters outside base64url', async () => {
    expect((await issuesOf('#plan=abc$def'))[0].message).toMatch(/altered or cut/);
  });

  it('a base64url length that cannot be', async () => {
    expect((await issuesOf('#plan=abcde'))[0].path).toBe('(link)');
  });

  it('cut short when copied', async () => {
    const link = await encodePlanLink(demoDocument);
    if (!link.ok) throw new Error('encode failed');
    const cut = link.fragment.slice(0, Math.floor(link.fragment.length * 0.7));
    const [i] = await issuesOf(cut);
    expect(i.path.startsWith('(link)')).toBe(true);
    expect(i.message).toMatch(/cut short|truncated/);
  });

  it('not deflate data', async () => {
    expect((await issuesOf('#plan=' + base64Url(new TextEncoder().encode('hello plan, not compressed at all'))))[0].message).toMatch(/does not decompress/);
  });

  it('a decompression bomb is stopped at the size cap', async () => {
    const [i] = await issuesOf(await textFragment(' '.repeat(MAX_PLAN_BYTES + 10)));
    expect(i.message).toMatch(/more than 2 MB/);
  });

  it('bytes that are not UTF-8 text', async () => {
    expect((await issuesOf(await deflateToFragment(new Uint8Array([0xff, 0xfe, 0xfd]))))[0].message).toMatch(/not text/);
  });

  it('decompressed data that is not JSON', async () => {
    expect((await issuesOf(await textFragment('{"format": "coolstage-plan", ')))[0]).toMatchObject({ path: '(link) (file)', message: expect.stringMatching(/not valid JSON/) });
  });

  it('a plan with an altered field names the field', async () => {
    const file = JSON.parse(planFileToText(demoDocument));
    file.main.part.shape.radiusM = -0.02;
    expect(await issuesOf(await textFragment(JSON.stringify(file)))).toEqual([{ path: '(link) main.part.shape.radiusM', message: 'radiusM must be greater than zero' }]);
  });

  it('a link over the length cap is refused before decoding', async () => {
    const [i] = await issuesOf('#plan=' + 'A'.repeat(MAX_PLAN_LINK_CHARS));
    expect(i.message).toMatch(/at most 60000/);
  });
});
