import { afterEach, describe, expect, it, vi } from 'vitest';
import type { PriceList } from '@shared/schemas/price-lists';
import { newUploadId, uploadPriceList, type UploadProgress } from '@/features/price-lists/api/upload-price-list';
import { ApiError } from '@/lib/api-client';

/** Enough of XMLHttpRequest to see what the upload sends and to answer it. */
class FakeXhr {
  static last: FakeXhr | null = null;
  static answer: { status: number; body: string } = { status: 201, body: '{}' };
  method = '';
  url = '';
  headers: Record<string, string> = {};
  body: FormData | null = null;
  withCredentials = false;
  status = 0;
  responseText = '';
  upload: { onprogress: ((e: { lengthComputable: boolean; loaded: number; total: number }) => void) | null; onload: (() => void) | null } =
    {
      onprogress: null,
      onload: null,
    };
  onload: (() => void) | null = null;
  onerror: (() => void) | null = null;
  onabort: (() => void) | null = null;
  open(method: string, url: string) {
    this.method = method;
    this.url = url;
  }
  setRequestHeader(name: string, value: string) {
    this.headers[name.toLowerCase()] = value;
  }
  abort() {
    this.onabort?.();
  }
  send(body: FormData) {
    FakeXhr.last = this;
    this.body = body;
    queueMicrotask(() => {
      this.upload.onprogress?.({ lengthComputable: true, loaded: 5, total: 10 });
      this.upload.onload?.();
      this.status = FakeXhr.answer.status;
      this.responseText = FakeXhr.answer.body;
      this.onload?.();
    });
  }
}

const file = () =>
  new File(['Part Number,Brand,Cost,List\nQW-IC 3101,Quaywell,25.20,51.99\n'], 'supplier-a-clean.csv', { type: 'text/csv' });

const ID = '6f1d2c3b-4a59-4e68-9a7b-8c9d0e1f2a3b';
const SUPPLIER = '0b7e9a3c-1d2f-4e5a-8b6c-7d8e9f0a1b2c';

const STAGED: PriceList = {
  id: ID,
  supplierId: SUPPLIER,
  supplierName: 'Pellworth Distribution',
  fileName: 'supplier-a-clean.csv',
  sha256: 'ab'.repeat(32),
  sizeBytes: 60,
  encoding: 'utf-8',
  delimiter: ',',
  columns: ['Part Number', 'Brand', 'Cost', 'List'],
  mapping: { 'Part Number': 'partNumber', Brand: 'brand', Cost: 'cost', List: 'list' },
  mappingSource: 'guessed',
  status: 'staged',
  stale: false,
  counts: { total: 1, new: 0, changed: 1, unchanged: 0, rejected: 0, firstPrices: 0, supersessions: 0 },
  flagged: 0,
  flagThresholdPct: 15,
  progress: { phase: 'done', rowsDone: 1, bytesRead: 60, bytesTotal: 60 },
  applied: null,
  createdBy: null,
  createdAt: '2026-12-01T10:00:00Z',
  committedBy: null,
  committedAt: null,
  discardedAt: null,
};

describe('price-list upload', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    FakeXhr.last = null;
  });

  function stub(answer: { status: number; body: string }) {
    FakeXhr.answer = answer;
    vi.stubGlobal('XMLHttpRequest', FakeXhr);
    vi.stubGlobal(
      'fetch',
      vi.fn(async (url: string) => {
        expect(url).toBe('/api/auth/csrf');
        return new Response(JSON.stringify({ token: 'tok-9' }), { status: 200 });
      }),
    );
  }

  it('posts the file, supplier and mapping with the CSRF token, and reports progress', async () => {
    stub({ status: 201, body: JSON.stringify(STAGED) });
    const seen: UploadProgress[] = [];
    const list = await uploadPriceList({ file: file(), supplierId: SUPPLIER, mapping: { Cost: 'cost' }, uploadId: ID }, (p) =>
      seen.push(p),
    );
    const xhr = FakeXhr.last!;
    expect(xhr.method).toBe('POST');
    expect(xhr.url).toBe('/api/price-lists');
    expect(xhr.headers['x-csrf-token']).toBe('tok-9');
    expect(xhr.body?.get('supplierId')).toBe(SUPPLIER);
    expect(xhr.body?.get('uploadId')).toBe(ID);
    expect(xhr.body?.get('mapping')).toBe('{"Cost":"cost"}');
    expect((xhr.body?.get('file') as File).name).toBe('supplier-a-clean.csv');
    expect(seen[0]).toEqual({ loaded: 5, total: 10, sent: false });
    expect(seen.at(-1)?.sent).toBe(true);
    expect(list.id).toBe(ID);
  });

  it('turns the error shape into an ApiError with its details', async () => {
    const body = { error: { code: 'unsupported_file', message: 'The file has no "List" column.', details: { missing: ['list'] } } };
    stub({ status: 422, body: JSON.stringify(body) });
    const err = await uploadPriceList({ file: file(), supplierId: SUPPLIER }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ApiError);
    expect(err).toMatchObject({
      status: 422,
      code: 'unsupported_file',
      message: 'The file has no "List" column.',
      details: { missing: ['list'] },
    });
  });

  it('a 413 without a JSON body still says the file is too large', async () => {
    stub({ status: 413, body: '<html>Request Entity Too Large</html>' });
    await expect(uploadPriceList({ file: file(), supplierId: SUPPLIER })).rejects.toMatchObject({ status: 413, code: 'payload_too_large' });
  });

  it('makes a v4 UUID the server accepts as an upload id', () => {
    const ids = new Set(Array.from({ length: 50 }, newUploadId));
    expect(ids.size).toBe(50);
    for (const id of ids) expect(id).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
  });
});
