// MOP file names: UTF-8 names come back as sent; a name with NUL is refused and leaves the stored document as it was.
import { booking, insertRing } from './helpers/ring-fixture';
import { setupWindowsApp, type WindowsContext } from './helpers/windows-app';

// This file books in September 2027 only.
const NOW = new Date('2027-03-01T08:00:00Z');
let ctx: WindowsContext;
let windowId: string;

beforeAll(async () => {
  ctx = await setupWindowsApp(NOW);
  const { id } = await insertRing(ctx.db, { prefix: ctx.prefix, ownTenantId: ctx.tenantId });
  const res = await (await ctx.as('engineer'))('post', '/api/windows').send(booking(ctx.prefix, 'mop names',
    '2027-09-07T22:00:00Z', '2027-09-08T02:00:00Z', [{ kind: 'span', id: id('r23'), effect: 'down' }]));
  expect(res.status).toBe(201);
  windowId = res.body.window.id;
});
afterAll(async () => {
  await ctx.cleanup();
  await ctx.close();
});

const NAME = 'Närvik 东京.txt';

test('a UTF-8 file name is stored and read back unchanged', async () => {
  const engineer = await ctx.as('engineer');
  const put = await engineer('put', `/api/windows/${windowId}/mop`)
    .attach('file', Buffer.from('1. Call the NOC\n'), { filename: NAME, contentType: 'text/plain' });
  expect(put.status).toBe(200);
  expect(put.body.fileName).toBe(NAME);
  expect((await engineer('get', `/api/windows/${windowId}`)).body.mop).toMatchObject({ fileName: NAME });
  const get = await engineer('get', `/api/windows/${windowId}/mop`);
  expect(get.status).toBe(200);
  // Non-Latin-1 names travel in the RFC 5987 filename* parameter, percent-encoded UTF-8.
  expect(get.headers['content-disposition']).toContain(`filename*=UTF-8''${encodeURIComponent(NAME).replace(/'/g, '%27')}`);
  const audit = await ctx.pool.query(`select after from audit_log where entity_id = $1 and action = 'window.mop.upload'`, [windowId]);
  expect(audit.rows.map((r) => r.after.fileName)).toEqual([NAME]);
});

/** A multipart body by hand: the RFC 5987 `filename*` form carries a percent-encoded NUL that no client library sends. */
function multipart(dispositionName: string, content: string): { type: string; body: Buffer } {
  const boundary = 'mop-names-boundary';
  const body = `--${boundary}\r\nContent-Disposition: form-data; name="file"; ${dispositionName}\r\n`
    + `Content-Type: text/plain\r\n\r\n${content}\r\n--${boundary}--\r\n`;
  return { type: `multipart/form-data; boundary=${boundary}`, body: Buffer.from(body, 'utf8') };
}

test.each([
  ['decoded from filename*', "filename*=UTF-8''steps%00.txt", 'MOP_BAD_FILE_NAME'],
  ['raw in the part header', 'filename="steps\u0000.txt"', 'MOP_BAD_UPLOAD'],
])('a file name with NUL (%s) is refused with 400 and the stored document stays', async (_how, disposition, code) => {
  const engineer = await ctx.as('engineer');
  const { type, body } = multipart(disposition, '2. Splice\n');
  const put = await engineer('put', `/api/windows/${windowId}/mop`).set('Content-Type', type).send(body);
  expect(put.status).toBe(400);
  expect(put.body.error.code).toBe(code);
  expect(put.body.error.message).toMatch(/file name|upload could not be read/);
  expect((await engineer('get', `/api/windows/${windowId}`)).body.mop).toMatchObject({ fileName: NAME });
  const audit = await ctx.pool.query(`select count(*)::int as n from audit_log where entity_id = $1 and action = 'window.mop.upload'`, [windowId]);
  expect(audit.rows[0].n).toBe(1);
});
