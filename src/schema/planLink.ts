// A plan document as a link: the version-2 file text, deflated (raw DEFLATE, RFC 1951, via the
// platform's CompressionStream), then base64url (RFC 4648, Sec. 5) in the URL fragment after "plan=".
// The fragment never reaches a server. Opening a link goes through the same door as a file
// (planFileFromText), so a tampered link is refused field by field like a bad file.
import { MAX_PLAN_BYTES, type PlanIssue } from './parsePlan';
import { planFileFromText, type PlanFileOutcome } from './planFileFromText';
import { planFileToText } from './planFileToText';
import type { PlanDocument } from './planDocument';

export const PLAN_LINK_KEY = 'plan=';
/** Longest fragment we write or read. Links far longer than this do not survive mail and chat tools. */
export const MAX_PLAN_LINK_CHARS = 60_000;

const BASE64URL = /^[A-Za-z0-9_-]*$/;

const fail = (message: string): PlanFileOutcome => ({ ok: false, issues: [{ path: '(link)', message }] });

async function pipeBytes(bytes: Uint8Array<ArrayBuffer>, transform: CompressionStream | DecompressionStream, maxBytes: number): Promise<Uint8Array | null> {
  const source = new ReadableStream<BufferSource>({
    start(controller) {
      controller.enqueue(bytes);
      controller.close();
    },
  });
  const reader = source.pipeThrough(transform).getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await reader.cancel();
      return null;
    }
    chunks.push(value);
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.byteLength;
  }
  return out;
}

function toBase64Url(bytes: Uint8Array): string {
  let binary = '';
  for (let i = 0; i < bytes.length; i += 0x8000) binary += String.fromCharCode(...bytes.subarray(i, i + 0x8000));
  return btoa(binary).replace(/\+/g, '-').replace(/\//g, '_').replace(/=+$/, '');
}

function fromBase64Url(text: string): Uint8Array<ArrayBuffer> {
  const b64 = text.replace(/-/g, '+').replace(/_/g, '/');
  const binary = atob(b64 + '='.repeat((4 - (b64.length % 4)) % 4));
  return Uint8Array.from(binary, (c) => c.charCodeAt(0));
}

export type PlanLinkOutcome = { ok: true; fragment: string } | { ok: false; issues: PlanIssue[] };

/** The fragment (without "#") that carries the document, or why it cannot be a link. */
export async function encodePlanLink(document: PlanDocument): Promise<PlanLinkOutcome> {
  const text = planFileToText(document, 'degC');
  const deflated = await pipeBytes(new TextEncoder().encode(text), new CompressionStream('deflate-raw'), MAX_PLAN_BYTES);
  const fragment = deflated ? PLAN_LINK_KEY + toBase64Url(deflated) : null;
  if (!fragment || fragment.length > MAX_PLAN_LINK_CHARS) {
    return { ok: false, issues: [{ path: '(link)', message: `the plan is too large for a link (over ${MAX_PLAN_LINK_CHARS} characters); save it as a file instead` }] };
  }
  return { ok: true, fragment };
}

/** True when the fragment (with or without "#") claims to carry a plan. */
export function isPlanLinkFragment(fragment: string): boolean {
  return fragment.replace(/^#/, '').startsWith(PLAN_LINK_KEY);
}

export async function decodePlanLink(fragment: string): Promise<PlanFileOutcome> {
  const bare = fragment.replace(/^#/, '');
  if (!bare.startsWith(PLAN_LINK_KEY)) return fail(`the link does not carry a plan (its fragment must start with "${PLAN_LINK_KEY}")`);
  const payload = bare.slice(PLAN_LINK_KEY.length);
  if (bare.length > MAX_PLAN_LINK_CHARS) return fail(`the link is ${bare.length} characters long; a plan link may be at most ${MAX_PLAN_LINK_CHARS}`);
  if (payload.length === 0) return fail('the link carries no plan data after "plan="');
  if (!BASE64URL.test(payload)) return fail('the link contains characters that cannot be part of a plan link; it may have been altered or cut when copied');
  let bytes: Uint8Array<ArrayBuffer>;
  try {
    bytes = fromBase64Url(payload);
  } catch {
    return fail('the link data is not valid base64url; it may have been altered or cut when copied');
  }
  let inflated: Uint8Array | null;
  try {
    inflated = await pipeBytes(bytes, new DecompressionStream('deflate-raw'), MAX_PLAN_BYTES);
  } catch {
    return fail('the link data does not decompress; it was cut short or altered');
  }
  if (!inflated) return fail(`the link unpacks to more than ${MAX_PLAN_BYTES / 1e6} MB; a plan is far smaller, so the link is refused`);
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(inflated);
  } catch {
    return fail('the link data is not text; it was altered');
  }
  const outcome = planFileFromText(text);
  return outcome.ok ? outcome : { ok: false, issues: outcome.issues.map((i) => ({ path: `(link) ${i.path}`, message: i.message })) };
}
