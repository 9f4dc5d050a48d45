import { randomBytes, randomUUID } from 'node:crypto';
import { mkdtempSync, readdirSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { crc32 } from 'node:zlib';
import sharp, { type Sharp } from 'sharp';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MAX_UPLOAD_BYTES } from '../src/uploads/upload-kinds';
import { vehicleModelId } from './support/catalogue';
import { anonymousSession, registerCustomer, signInAs, type Session } from './support/sessions';
import { startTestApp, type TestApp } from './support/test-app';

interface UploadBody {
  id: string;
  kind: string;
  format: string;
  bytes: number;
  widthPx: number;
  heightPx: number;
  originalName: string;
  createdAt: string;
  quoteId: string | null;
  url: string;
  thumbnailUrl: string;
}

interface ErrorBody {
  statusCode: number;
  message: string;
  fieldErrors?: Record<string, string[]>;
}

interface UploadRow {
  storage_key: string;
  thumbnail_key: string;
  owner_id: string;
  quote_id: string | null;
  bytes: number;
}

const NOT_AN_IMAGE = 'is not a JPEG, PNG or WebP image (checked by its content, not its name)';
const RANDOM_NAME = /^[0-9a-f]{32}\.(jpg|png|webp)$/;

/** A photo-like image (random pixels), so it keeps a realistic size. */
function noise(width: number, height: number): Sharp {
  return sharp(randomBytes(width * height * 3), { raw: { width, height, channels: 3 } });
}

/**
 * A valid PNG of exactly `totalBytes`: a small image with a private ancillary chunk of padding
 * after IHDR (decoders skip ancillary chunks they do not know).
 */
function paddedPng(png: Buffer, totalBytes: number): Buffer {
  // Source: PNG Specification (ISO/IEC 15948), 5.2 PNG signature (8 bytes), 5.3 Chunk layout
  // (length, type, data, CRC-32 of type and data), 5.4 Chunk naming conventions (a lower-case
  // first letter marks an ancillary chunk, a lower-case second letter a private one)
  const afterIhdr = 8 + 12 + 13;
  const chunks: Buffer[] = [];
  let missing = totalBytes - png.length;
  while (missing > 0) {
    const dataLength = Math.min(missing - 12, 1024 * 1024);
    const type = Buffer.from('lwPd', 'latin1');
    const data = Buffer.alloc(dataLength, 0x20);
    const length = Buffer.alloc(4);
    length.writeUInt32BE(dataLength);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(Buffer.concat([type, data])));
    chunks.push(length, type, data, crc);
    missing -= dataLength + 12;
  }
  const padded = Buffer.concat([png.subarray(0, afterIhdr), ...chunks, png.subarray(afterIhdr)]);
  if (padded.length !== totalBytes)
    throw new Error(`padded to ${padded.length}, not ${totalBytes}`);
  return padded;
}

describe('customer photo uploads (HTTP)', () => {
  let testApp: TestApp;
  let uploadDir: string;
  let owner: Session & { id: string };
  let other: Session & { id: string };
  let desk: Session;
  let tech: Session;
  let manager: Session;
  let startedAt: Date;

  beforeAll(async () => {
    uploadDir = mkdtempSync(join(tmpdir(), 'liftwright-uploads-spec-'));
    process.env.UPLOAD_DIR = uploadDir;
    testApp = await startTestApp();
    owner = await registerCustomer(testApp);
    other = await registerCustomer(testApp);
    desk = await signInAs(testApp, 'desk');
    tech = await signInAs(testApp, 'tech');
    manager = await signInAs(testApp, 'manager');
    startedAt = (await testApp.db.query<{ now: Date }>('select now()')).rows[0].now;
  });

  afterAll(async () => {
    await testApp.close();
    delete process.env.UPLOAD_DIR;
    rmSync(uploadDir, { recursive: true, force: true });
  });

  const files = (): string[] => readdirSync(uploadDir).sort();

  const rowsOf = async (ownerId: string): Promise<UploadRow[]> =>
    (
      await testApp.db.query<UploadRow>(
        'select storage_key, thumbnail_key, owner_id, quote_id, bytes from upload where owner_id = $1 order by created_at',
        [ownerId],
      )
    ).rows;

  const rowOf = async (id: string): Promise<UploadRow> => {
    const result = await testApp.db.query<UploadRow>(
      'select storage_key, thumbnail_key, owner_id, quote_id, bytes from upload where id = $1',
      [id],
    );
    expect(result.rows).toHaveLength(1);
    return result.rows[0];
  };

  const send = (
    session: Session,
    content: Buffer,
    { filename = 'photo.jpg', contentType = 'image/jpeg', kind = 'vehicle' } = {},
  ) =>
    session.agent
      .post('/api/uploads')
      .set('x-csrf-token', session.csrfToken)
      .field('kind', kind)
      .attach('photo', content, { filename, contentType });

  const stored = async (session: Session, content: Buffer, filename: string) => {
    const response = await send(session, content, { filename });
    expect(response.status, JSON.stringify(response.body)).toBe(201);
    return response.body as UploadBody;
  };

  /** A refused upload left no file and no row. */
  const expectNothingStored = async (before: string[], ownerId: string, rowsBefore: number) => {
    expect(files()).toEqual(before);
    expect(await rowsOf(ownerId)).toHaveLength(rowsBefore);
  };

  describe('storing', () => {
    it.each([
      // Source: ITU-T T.81 (JPEG), Table B.1: SOI marker X'FFD8', then a marker X'FF..'
      [
        'jpeg',
        'ute.jpg',
        () => noise(900, 600).jpeg().toBuffer(),
        'jpg',
        Buffer.from([0xff, 0xd8, 0xff]),
      ],
      // Source: PNG Specification (ISO/IEC 15948), 5.2 PNG signature 137 80 78 71 13 10 26 10
      [
        'png',
        'placard.png',
        () => noise(900, 600).png().toBuffer(),
        'png',
        Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
      ],
      // Source: RFC 9649 (WebP Image Format), RIFF header: "RIFF", file size, "WEBP"
      [
        'webp',
        'wheel.webp',
        () => noise(900, 600).webp().toBuffer(),
        'webp',
        Buffer.from('RIFF', 'latin1'),
      ],
    ] as const)(
      'stores a %s: 201, the original and a thumbnail under random names, owner-only',
      async (format, filename, make, extension, magic) => {
        const before = files();
        const body = await stored(owner, await make(), filename);
        expect(body).toMatchObject({
          kind: 'vehicle',
          format,
          widthPx: 900,
          heightPx: 600,
          originalName: filename,
          quoteId: null,
          url: `/api/uploads/${body.id}`,
          thumbnailUrl: `/api/uploads/${body.id}/thumbnail`,
        });
        expect(Date.parse(body.createdAt)).not.toBeNaN();

        const row = await rowOf(body.id);
        expect(row.owner_id).toBe(owner.id);
        const added = files().filter((name) => !before.includes(name));
        expect(added.sort()).toEqual([row.storage_key, row.thumbnail_key].sort());
        for (const name of added) {
          expect(name).toMatch(RANDOM_NAME);
          expect(name).not.toContain(filename.split('.')[0]);
          expect(statSync(join(uploadDir, name)).mode & 0o777).toBe(0o600);
        }
        expect(row.storage_key.endsWith(`.${extension}`)).toBe(true);
        expect(row.thumbnail_key.endsWith('.webp')).toBe(true);

        const original = readFileSync(join(uploadDir, row.storage_key));
        expect(original.subarray(0, magic.length)).toEqual(magic);
        expect(body.bytes).toBe(original.length);
        expect(row.bytes).toBe(original.length);
        const originalMeta = await sharp(original).metadata();
        expect([originalMeta.format, originalMeta.width, originalMeta.height]).toEqual([
          format,
          900,
          600,
        ]);
        const thumbnailMeta = await sharp(
          readFileSync(join(uploadDir, row.thumbnail_key)),
        ).metadata();
        expect(thumbnailMeta.format).toBe('webp');
        expect(thumbnailMeta.width).toBeLessThanOrEqual(320);
        expect(thumbnailMeta.height).toBeLessThanOrEqual(320);
        expect(Math.max(thumbnailMeta.width ?? 0, thumbnailMeta.height ?? 0)).toBe(320);
      },
    );

    it('strips EXIF (camera and GPS) from a JPEG: on disk and as served', async () => {
      const input = await noise(640, 480)
        .jpeg()
        .withExif({
          IFD0: { Make: 'Brellin Cameras', Copyright: 'Tallowgate test' },
          IFD3: { GPSLatitudeRef: 'S', GPSLatitude: '33/1 52/1 0/1' },
        })
        .toBuffer();
      expect((await sharp(input).metadata()).exif).toBeDefined();
      expect(input.includes(Buffer.from('Brellin Cameras'))).toBe(true);

      const body = await stored(owner, input, 'with-exif.jpg');
      const row = await rowOf(body.id);
      const onDisk = readFileSync(join(uploadDir, row.storage_key));
      const served = (await owner.agent.get(body.url).expect(200)).body as Buffer;
      expect(served.equals(onDisk)).toBe(true);
      for (const bytes of [onDisk, readFileSync(join(uploadDir, row.thumbnail_key))]) {
        const metadata = await sharp(bytes).metadata();
        expect(metadata.exif).toBeUndefined();
        // Source: CIPA DC-008 (Exif), the APP1 segment starts with the identifier "Exif\0\0"
        expect(bytes.includes(Buffer.from('Exif\0\0', 'latin1'))).toBe(false);
        expect(bytes.includes(Buffer.from('Brellin Cameras'))).toBe(false);
      }
    });

    it('accepts a file of exactly 10 MB (the limit is not refused for size)', async () => {
      const png = await noise(64, 48).png().toBuffer();
      const atLimit = paddedPng(png, MAX_UPLOAD_BYTES);
      expect(atLimit.length).toBe(MAX_UPLOAD_BYTES);
      const body = await stored(owner, atLimit, 'padded.png');
      expect(body).toMatchObject({ format: 'png', widthPx: 64, heightPx: 48 });
      // The re-encoded copy keeps the pixels, not the padding chunks.
      expect(body.bytes).toBeLessThan(100_000);
      const onDisk = readFileSync(join(uploadDir, (await rowOf(body.id)).storage_key));
      expect(onDisk.includes(Buffer.from('lwPd', 'latin1'))).toBe(false);
    });

    it('lets desk and manager upload too (they own what they upload)', async () => {
      const deskPhoto = await stored(desk, await noise(50, 50).png().toBuffer(), 'desk.png');
      const managerPhoto = await stored(manager, await noise(50, 50).png().toBuffer(), 'm.png');
      const deskList = (await desk.agent.get('/api/uploads').expect(200)).body as {
        items: UploadBody[];
      };
      expect(deskList.items.map((item) => item.id)).toContain(deskPhoto.id);
      expect(deskList.items.map((item) => item.id)).not.toContain(managerPhoto.id);
    });
  });

  describe('refusing', () => {
    it.each([
      ['a text file', Buffer.from('These are not the pixels you are looking for.\n')],
      ['a PDF', Buffer.from('%PDF-1.7\n1 0 obj\n<< /Type /Catalog >>\nendobj\ntrailer\n%%EOF\n')],
    ])(
      'refuses %s named photo.jpg and sent as image/jpeg: 400, nothing stored',
      async (_label, content) => {
        const before = files();
        const rowsBefore = (await rowsOf(owner.id)).length;
        const response = await send(owner, content, {
          filename: 'photo.jpg',
          contentType: 'image/jpeg',
        }).expect(400);
        const body = response.body as ErrorBody;
        expect(body.fieldErrors).toEqual({ photo: [NOT_AN_IMAGE] });
        expect(body.message).toBe(
          'The photo is not a JPEG, PNG or WebP image (checked by its content, not its name)',
        );
        await expectNothingStored(before, owner.id, rowsBefore);
      },
    );

    it('refuses a GIF, whatever its name says', async () => {
      const before = files();
      const rowsBefore = (await rowsOf(owner.id)).length;
      const gif = await noise(20, 20).gif().toBuffer();
      const response = await send(owner, gif, { filename: 'photo.png', contentType: 'image/png' });
      expect(response.status).toBe(400);
      expect((response.body as ErrorBody).fieldErrors).toEqual({ photo: [NOT_AN_IMAGE] });
      await expectNothingStored(before, owner.id, rowsBefore);
    });

    it('refuses one byte over 10 MB with 413, nothing stored', async () => {
      const before = files();
      const rowsBefore = (await rowsOf(owner.id)).length;
      const png = await noise(64, 48).png().toBuffer();
      const tooLarge = paddedPng(png, MAX_UPLOAD_BYTES + 1);
      const response = await send(owner, tooLarge, {
        filename: 'big.png',
        contentType: 'image/png',
      }).expect(413);
      const body = response.body as ErrorBody;
      expect(body.message).toBe('The photo is larger than 10 MB');
      expect(body.fieldErrors).toEqual({ photo: ['is larger than 10 MB'] });
      await expectNothingStored(before, owner.id, rowsBefore);
    });

    it('refuses an image of more than 40 megapixels', async () => {
      const before = files();
      const rowsBefore = (await rowsOf(owner.id)).length;
      const bomb = await sharp({
        create: { width: 8000, height: 6000, channels: 3, background: '#204060' },
      })
        .png()
        .toBuffer();
      const response = await send(owner, bomb, { filename: 'bomb.png' }).expect(400);
      expect((response.body as ErrorBody).fieldErrors).toEqual({
        photo: ['is 8000 × 6000 pixels; at most 40 megapixels are accepted'],
      });
      await expectNothingStored(before, owner.id, rowsBefore);
    });

    it('refuses an unknown kind, a missing photo, two photos and a missing CSRF token', async () => {
      const before = files();
      const rowsBefore = (await rowsOf(owner.id)).length;
      const png = await noise(30, 30).png().toBuffer();

      const badKind = await send(owner, png, { kind: 'selfie' }).expect(400);
      expect((badKind.body as ErrorBody).fieldErrors).toEqual({
        kind: ['must be one of vehicle, tyre-placard'],
      });

      const noPhoto = await owner.agent
        .post('/api/uploads')
        .set('x-csrf-token', owner.csrfToken)
        .field('kind', 'vehicle')
        .expect(400);
      expect((noPhoto.body as ErrorBody).fieldErrors?.photo).toEqual([
        'attach a JPEG, PNG or WebP photo in the form field "photo"',
      ]);

      const twoPhotos = await owner.agent
        .post('/api/uploads')
        .set('x-csrf-token', owner.csrfToken)
        .field('kind', 'vehicle')
        .attach('photo', png, { filename: 'a.png', contentType: 'image/png' })
        .attach('photo', png, { filename: 'b.png', contentType: 'image/png' })
        .expect(400);
      expect((twoPhotos.body as ErrorBody).fieldErrors?.photo).toEqual([
        'send one photo, in the form field "photo"',
      ]);

      const unexpected = await owner.agent
        .post('/api/uploads')
        .set('x-csrf-token', owner.csrfToken)
        .field('kind', 'vehicle')
        .attach('picture', png, { filename: 'a.png', contentType: 'image/png' })
        .expect(400);
      expect((unexpected.body as ErrorBody).fieldErrors?.photo).toEqual([
        'send one photo, in the form field "photo"',
      ]);

      await owner.agent
        .post('/api/uploads')
        .field('kind', 'vehicle')
        .attach('photo', png, { filename: 'a.png', contentType: 'image/png' })
        .expect(403);

      await expectNothingStored(before, owner.id, rowsBefore);
    });

    it('keeps at most 20 photos waiting for a quote per owner', async () => {
      const busy = await registerCustomer(testApp);
      const png = await noise(24, 24).png().toBuffer();
      for (let index = 0; index < 20; index += 1) {
        await send(busy, png, { filename: `p${index}.png` }).expect(201);
      }
      const before = files();
      const response = await send(busy, png, { filename: 'p20.png' }).expect(400);
      expect((response.body as ErrorBody).fieldErrors?.photo).toEqual([
        'you already have 20 photos that are not on a quote; remove one or save the quote first',
      ]);
      await expectNothingStored(before, busy.id, 20);

      // Removing one makes room again.
      const list = (await busy.agent.get('/api/uploads').expect(200)).body as {
        items: UploadBody[];
      };
      expect(list.items).toHaveLength(20);
      await busy.agent.delete(list.items[0].url).set('x-csrf-token', busy.csrfToken).expect(204);
      await send(busy, png, { filename: 'p21.png' }).expect(201);
    });
  });

  describe('reading', () => {
    let photo: UploadBody;
    let row: UploadRow;

    beforeAll(async () => {
      photo = await stored(owner, await noise(800, 500).png().toBuffer(), 'front.png');
      row = await rowOf(photo.id);
    });

    it('serves the owner the photo and its thumbnail with the right headers', async () => {
      const original = await owner.agent.get(photo.url).expect(200);
      expect(original.headers['content-type']).toBe('image/png');
      expect(original.headers['x-content-type-options']).toBe('nosniff');
      expect(original.headers['content-disposition']).toBe('inline');
      expect(original.headers['cache-control']).toBe('private, max-age=300');
      expect((original.body as Buffer).equals(readFileSync(join(uploadDir, row.storage_key)))).toBe(
        true,
      );

      const thumbnail = await owner.agent.get(photo.thumbnailUrl).expect(200);
      expect(thumbnail.headers['content-type']).toBe('image/webp');
      expect(thumbnail.headers['x-content-type-options']).toBe('nosniff');
      expect(thumbnail.headers['cache-control']).toBe('private, max-age=300');
      const thumbnailMeta = await sharp(thumbnail.body as Buffer).metadata();
      expect([thumbnailMeta.format, thumbnailMeta.width, thumbnailMeta.height]).toEqual([
        'webp',
        320,
        200,
      ]);
    });

    it('answers another customer 404 for the photo and the thumbnail, as for an unknown id', async () => {
      for (const url of [photo.url, photo.thumbnailUrl]) {
        const response = await other.agent.get(url).expect(404);
        expect((response.body as ErrorBody).message).toBe('No photo has this id');
      }
      const unknown = await owner.agent.get(`/api/uploads/${randomUUID()}`).expect(404);
      expect((unknown.body as ErrorBody).message).toBe('No photo has this id');
      const malformed = await owner.agent.get('/api/uploads/not-an-id').expect(400);
      expect((malformed.body as ErrorBody).fieldErrors).toEqual({ id: ['must be a UUID'] });
    });

    it('serves staff (desk, tech, manager) any photo; a guest gets 401', async () => {
      for (const staff of [desk, tech, manager]) {
        const response = await staff.agent.get(photo.url).expect(200);
        expect(response.headers['content-type']).toBe('image/png');
        await staff.agent.get(photo.thumbnailUrl).expect(200);
      }
      const guest = await anonymousSession(testApp);
      await guest.agent.get(photo.url).expect(401);
      await guest.agent.get(photo.thumbnailUrl).expect(401);
      await request(testApp.server).get(photo.url).expect(401);
    });

    it("lists only the caller's own photos, newest first; tech may not list", async () => {
      const mine = (await owner.agent.get('/api/uploads').expect(200)).body as {
        items: UploadBody[];
      };
      expect(mine.items[0].id).toBe(photo.id);
      expect(mine.items.every((item) => item.url === `/api/uploads/${item.id}`)).toBe(true);
      const ownIds = (await rowsOf(owner.id)).length;
      expect(mine.items).toHaveLength(ownIds);
      const theirs = (await other.agent.get('/api/uploads').expect(200)).body as {
        items: UploadBody[];
      };
      expect(theirs.items.map((item) => item.id)).not.toContain(photo.id);
      await tech.agent.get('/api/uploads').expect(403);
      const badFilter = await owner.agent.get('/api/uploads?quoteId=nope').expect(400);
      expect((badFilter.body as ErrorBody).fieldErrors).toEqual({ quoteId: ['must be a UUID'] });
    });
  });

  describe('photos on a quote', () => {
    it('filters by quote, keeps an attached photo from deletion, and shows it to staff', async () => {
      const customer = await registerCustomer(testApp);
      const onQuote = await stored(customer, await noise(60, 40).jpeg().toBuffer(), 'q.jpg');
      const loose = await stored(customer, await noise(60, 40).jpeg().toBuffer(), 'l.jpg');
      // A bare quote row written past the API (the quotes routes attach photos the same way).
      const model = await vehicleModelId(testApp.db, 'Vantrel', 'Strata', 'SR dual cab');
      const quoteId = randomUUID();
      await testApp.db.query(
        `insert into quote (id, created_at, updated_at, customer_id, created_by_id, vehicle_model_id, uses)
         values ($1, now(), now(), $2, $2, $3, '[]')`,
        [quoteId, customer.id, model],
      );
      await testApp.db.query('update upload set quote_id = $1 where id = $2', [
        quoteId,
        onQuote.id,
      ]);

      const filtered = (await customer.agent.get(`/api/uploads?quoteId=${quoteId}`).expect(200))
        .body as { items: UploadBody[] };
      expect(filtered.items.map((item) => [item.id, item.quoteId])).toEqual([
        [onQuote.id, quoteId],
      ]);
      const none = (await customer.agent.get(`/api/uploads?quoteId=${randomUUID()}`).expect(200))
        .body as { items: UploadBody[] };
      expect(none.items).toEqual([]);

      const before = files();
      const refused = await customer.agent
        .delete(onQuote.url)
        .set('x-csrf-token', customer.csrfToken)
        .expect(409);
      expect((refused.body as ErrorBody).message).toMatch(/on a saved quote/);
      expect(files()).toEqual(before);
      await desk.agent.get(onQuote.url).expect(200);
      await other.agent.get(onQuote.url).expect(404);

      await customer.agent.delete(loose.url).set('x-csrf-token', customer.csrfToken).expect(204);
      expect((await rowsOf(customer.id)).map((item) => item.quote_id)).toEqual([quoteId]);
      // The bare row has no version; later suites list every quote, so it goes again.
      await testApp.db.query('delete from quote where id = $1', [quoteId]);
    });
  });

  describe('deleting', () => {
    it('lets only the owner delete: another customer 404, the owner 204 and the files go', async () => {
      const photo = await stored(owner, await noise(120, 90).webp().toBuffer(), 'gone.webp');
      const row = await rowOf(photo.id);
      const paths = [row.storage_key, row.thumbnail_key];
      expect(files()).toEqual(expect.arrayContaining(paths));

      const refused = await other.agent
        .delete(photo.url)
        .set('x-csrf-token', other.csrfToken)
        .expect(404);
      expect((refused.body as ErrorBody).message).toBe('No photo has this id');
      await desk.agent.delete(photo.url).set('x-csrf-token', desk.csrfToken).expect(404);
      await tech.agent.delete(photo.url).set('x-csrf-token', tech.csrfToken).expect(403);
      await owner.agent.delete(photo.url).expect(403);
      expect(files()).toEqual(expect.arrayContaining(paths));

      await owner.agent.delete(photo.url).set('x-csrf-token', owner.csrfToken).expect(204);
      for (const path of paths) expect(files()).not.toContain(path);
      const left = await testApp.db.query('select 1 from upload where id = $1', [photo.id]);
      expect(left.rows).toEqual([]);
      await owner.agent.get(photo.url).expect(404);
      await owner.agent.delete(photo.url).set('x-csrf-token', owner.csrfToken).expect(404);
    });
  });

  it('leaves no file without a row, and no row without its files', async () => {
    const rows = (
      await testApp.db.query<UploadRow>(
        'select storage_key, thumbnail_key from upload where created_at >= $1',
        [startedAt],
      )
    ).rows;
    const keys = rows.flatMap((item) => [item.storage_key, item.thumbnail_key]).sort();
    expect(files()).toEqual(keys);
  });
});
