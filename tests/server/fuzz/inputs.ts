// fast-check arbitraries for hostile requests: path values, query strings, JSON bodies and odd body headers.
import fc from 'fast-check';

/** Path segments sent as raw bytes of the URL (already percent-encoded or deliberately broken). */
const RAW_SEGMENTS = ['%00', 'a%00b', '%E0%A4%A', '%', '%zz', '%ED%A0%80', '%C0%80', '%FF', '..', '%2F', '%20', 'x'.repeat(5000)];
const HOSTILE_TEXT = ['\u0000', 'a\u0000b', 'x\ud800y', '\udc00', '\ud83d', "'; drop table windows; --", '$1', '\\', '%', 'x'.repeat(20_000), ''];

export const hostileText = fc.oneof(
  fc.constantFrom(...HOSTILE_TEXT),
  fc.string({ unit: 'binary', maxLength: 40 }),
  fc.string({ maxLength: 40 }),
);

/** A path parameter: a real id, a hostile or random string (percent-encoded), or raw broken percent-encoding. */
export function pathValue(realIds: string[]) {
  const encoded = fc.oneof(fc.constantFrom(...realIds), hostileText).map((s) => {
    try {
      return encodeURIComponent(s);
    } catch {
      return '%ED%A0%80'; // a lone surrogate cannot be encoded; send the bytes UTF-8 would have used
    }
  });
  return fc.oneof({ weight: 3, arbitrary: encoded }, { weight: 2, arbitrary: fc.constantFrom(...RAW_SEGMENTS) });
}

const QUERY_KEYS = ['from', 'to', 'element', 'status', 'tenant', 'mine', 'limit', 'offset', 'kind', 'q', 'cursor', 'k\u0000'];
export function queryString(realIds: string[]) {
  const value = fc.oneof(fc.constantFrom(...realIds, '2030-01-01T00:00:00Z', 'true', '-1', '1e309'), hostileText);
  return fc.dictionary(fc.constantFrom(...QUERY_KEYS), value, { maxKeys: 3 }).map((q) =>
    Object.entries(q).map(([k, v]) => `${encodeURIComponent(k)}=${safeEncode(v)}`).join('&'));
}

function safeEncode(s: string): string {
  try {
    return encodeURIComponent(s);
  } catch {
    return '%ED%A0%80';
  }
}

const VALID_WINDOW = {
  title: 'Fuzzed window', startsAt: '2031-03-01T01:00:00Z', endsAt: '2031-03-01T03:00:00Z',
  elements: [{ kind: 'site', id: 'x' }], version: 1, to: 'submitted', reason: 'r', pinned: [], decision: 'approve',
  code: '123456', email: 'nobody@test.example', password: 'wrong-password', name: 'n', noticeDays: 3, days: 3,
};
type Json = unknown;

/** A valid-looking body with one field replaced, or any JSON value, or a huge or deeply nested one. */
export function jsonBody(realIds: string[]) {
  const fieldValue: fc.Arbitrary<Json> = fc.oneof(
    hostileText, fc.constantFrom(...realIds), fc.integer(), fc.double(), fc.boolean(), fc.constant(null),
    fc.array(hostileText, { maxLength: 3 }), fc.array(fc.record({ kind: hostileText, id: fc.oneof(hostileText, fc.constantFrom(...realIds)) }), { maxLength: 3 }),
  );
  const mutated = fc.tuple(fc.constantFrom(...Object.keys(VALID_WINDOW)), fieldValue)
    .map(([key, v]) => ({ ...VALID_WINDOW, [key]: v }));
  return fc.oneof({ weight: 5, arbitrary: mutated }, { weight: 2, arbitrary: fc.jsonValue({ maxDepth: 3 }) });
}

export type OddBody = { contentType: string; contentEncoding?: string; bytes: string };
/** A body the parser must refuse or pass through: wrong or broken type, unknown or corrupt encoding. */
const oddHeaders: fc.Arbitrary<OddBody> = fc.record({
  contentType: fc.constantFrom('application/json', 'application/json; charset=x-klingon', 'text/plain',
    'multipart/form-data', 'multipart/form-data; boundary=x', 'application/x-www-form-urlencoded', 'application/octet-stream'),
  contentEncoding: fc.option(fc.constantFrom('gzip', 'br', 'deflate', 'zstd', 'x-unknown', 'gzip, br', 'identity'), { nil: undefined }),
  bytes: fc.oneof(fc.constantFrom('{"title":', '{"title":"\\u0000"}', '--x\r\nContent-Disposition: form-data; name="file"\r\n\r\n', '\u0000'), fc.string({ maxLength: 60 })),
});

/** Deeply nested JSON arrays, sent as text (a parsed copy would overflow fast-check's own printing). */
const deepJson: fc.Arbitrary<OddBody> = fc.integer({ min: 1000, max: 20_000 })
  .map((n) => ({ contentType: 'application/json', bytes: `{"title":${'['.repeat(n)}${']'.repeat(n)}}` }));

export const oddBody: fc.Arbitrary<OddBody> = fc.oneof({ weight: 4, arbitrary: oddHeaders }, { weight: 1, arbitrary: deepJson });
