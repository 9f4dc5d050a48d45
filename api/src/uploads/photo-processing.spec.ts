import { randomBytes } from 'node:crypto';
import sharp, { type Sharp } from 'sharp';
import { describe, expect, it } from 'vitest';
import {
  cleanOriginalName,
  DAMAGED_IMAGE_REASON,
  MAX_INPUT_PIXELS,
  NOT_AN_IMAGE_REASON,
  processPhoto,
  THUMBNAIL_MAX_PX,
} from './photo-processing';

/** A photo-like image: random pixels, so it does not compress to nothing. */
function noise(width: number, height: number): Sharp {
  return sharp(randomBytes(width * height * 3), { raw: { width, height, channels: 3 } });
}

async function processed(input: Buffer) {
  const result = await processPhoto(input);
  if (!result.ok) throw new Error(`refused: ${result.reason}`);
  return result.photo;
}

describe('processPhoto', () => {
  it.each([
    ['jpeg', () => noise(1200, 800).jpeg().toBuffer()],
    ['png', () => noise(1200, 800).png().toBuffer()],
    ['webp', () => noise(1200, 800).webp().toBuffer()],
  ] as const)(
    'keeps a %s as that format and makes a WebP thumbnail of at most 320 px',
    async (format, make) => {
      const photo = await processed(await make());
      expect(photo.format).toBe(format);
      expect([photo.widthPx, photo.heightPx]).toEqual([1200, 800]);
      const original = await sharp(photo.original).metadata();
      expect([original.format, original.width, original.height]).toEqual([format, 1200, 800]);
      const thumbnail = await sharp(photo.thumbnail).metadata();
      expect(thumbnail.format).toBe('webp');
      expect(Math.max(thumbnail.width ?? 0, thumbnail.height ?? 0)).toBe(THUMBNAIL_MAX_PX);
      // The side ratio is kept: 1200 × 800 becomes 320 × 213.
      expect(thumbnail.height).toBe(213);
    },
  );

  it('does not enlarge a photo smaller than the thumbnail', async () => {
    const photo = await processed(await noise(200, 120).png().toBuffer());
    const thumbnail = await sharp(photo.thumbnail).metadata();
    expect([thumbnail.width, thumbnail.height]).toEqual([200, 120]);
  });

  it('drops EXIF (camera, GPS) and turns the photo upright by its orientation tag', async () => {
    const input = await noise(400, 200)
      .jpeg()
      .withExif({
        IFD0: { Make: 'Vantrel Optics', Copyright: 'Kestrelmere test' },
        IFD3: { GPSLatitudeRef: 'S', GPSLatitude: '33/1 52/1 0/1' },
      })
      .withMetadata({ orientation: 6 })
      .toBuffer();
    const sent = await sharp(input).metadata();
    expect(sent.exif).toBeDefined();
    expect(sent.orientation).toBe(6);

    const photo = await processed(input);
    const stored = await sharp(photo.original).metadata();
    expect(stored.exif).toBeUndefined();
    expect(stored.orientation).toBeUndefined();
    expect(stored.icc).toBeUndefined();
    expect(stored.xmp).toBeUndefined();
    // Source: CIPA DC-008 (Exif), the APP1 segment starts with the identifier "Exif\0\0"
    expect(photo.original.includes(Buffer.from('Exif\0\0', 'latin1'))).toBe(false);
    expect(photo.original.includes(Buffer.from('Vantrel Optics'))).toBe(false);
    expect(photo.thumbnail.includes(Buffer.from('Vantrel Optics'))).toBe(false);
    // Orientation 6 means "rotate 90° clockwise to view": the upright photo is 200 × 400.
    // Source: CIPA DC-008 (Exif), tag Orientation (0x0112), value 6
    expect([photo.widthPx, photo.heightPx]).toEqual([200, 400]);
    expect([stored.width, stored.height]).toEqual([200, 400]);
  });

  it.each([
    ['plain text', () => Promise.resolve(Buffer.from('just some words, not a photo\n'))],
    ['a PDF', () => Promise.resolve(Buffer.from('%PDF-1.4\n1 0 obj << >> endobj\n%%EOF\n'))],
    ['a GIF', () => noise(40, 40).gif().toBuffer()],
    ['a TIFF', () => noise(40, 40).tiff().toBuffer()],
    [
      'an SVG',
      () =>
        Promise.resolve(
          Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="40" height="40"></svg>'),
        ),
    ],
    ['nothing', () => Promise.resolve(Buffer.alloc(0))],
  ])('refuses %s by its content', async (_label, make) => {
    expect(await processPhoto(await make())).toEqual({ ok: false, reason: NOT_AN_IMAGE_REASON });
  });

  it('refuses a photo cut short', async () => {
    const whole = await noise(300, 200).jpeg().toBuffer();
    const cut = whole.subarray(0, Math.floor(whole.length * 0.6));
    expect(await processPhoto(cut)).toEqual({ ok: false, reason: DAMAGED_IMAGE_REASON });
  });

  it('refuses more than 40 megapixels before decoding them', async () => {
    // 7000 × 6000 = 42 MP of one colour: a small file that would need 126 MB to decode.
    const bomb = await sharp({
      create: { width: 7000, height: 6000, channels: 3, background: '#808080' },
    })
      .png()
      .toBuffer();
    expect(bomb.length).toBeLessThan(1024 * 1024);
    expect(7000 * 6000).toBeGreaterThan(MAX_INPUT_PIXELS);
    expect(await processPhoto(bomb)).toEqual({
      ok: false,
      reason: 'is 7000 × 6000 pixels; at most 40 megapixels are accepted',
    });
  });
});

describe('cleanOriginalName', () => {
  it.each([
    [undefined, ''],
    ['', ''],
    ['ute-front.jpg', 'ute-front.jpg'],
    ['C:\\Users\\robin\\Pictures\\placard.png', 'placard.png'],
    ['../../etc/passwd', 'passwd'],
    ['  two\t\tspaces\n.jpg ', 'two spaces .jpg'],
    ['bidi\u202Egpj.exe', 'bidigpj.exe'],
    ['café.jpg', 'café.jpg'],
  ])('cleans %j to %j', (input, expected) => {
    expect(cleanOriginalName(input)).toBe(expected);
  });

  it('keeps at most 120 characters', () => {
    expect(cleanOriginalName(`${'a'.repeat(200)}.jpg`)).toHaveLength(120);
  });
});
