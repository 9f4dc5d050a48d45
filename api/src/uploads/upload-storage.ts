import { randomBytes } from 'node:crypto';
import { createReadStream, type ReadStream } from 'node:fs';
import { rm, stat, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { Injectable, Logger } from '@nestjs/common';
import { AppConfigService } from '../config/app-config.service';

/** A stored file's name: 32 random hex digits and our own extension, nothing from the client. */
const STORAGE_KEY = /^[0-9a-f]{32}\.(jpg|png|webp)$/;

/** The photo files in UPLOAD_DIR (outside the web root; served only by the upload routes). */
@Injectable()
export class UploadStorage {
  private readonly logger = new Logger(UploadStorage.name);

  constructor(private readonly config: AppConfigService) {}

  /** Writes a new owner-only file under a random name and returns that name. */
  async write(data: Buffer, extension: string): Promise<string> {
    const key = `${randomBytes(16).toString('hex')}.${extension}`;
    // 'wx': never overwrite (a clash of 128 random bits would fail loudly, not replace a photo).
    await writeFile(this.pathOf(key), data, { mode: 0o600, flag: 'wx' });
    return key;
  }

  /** The file to stream, or null when it is not on disk. */
  async open(key: string): Promise<{ stream: ReadStream; bytes: number } | null> {
    const path = this.pathOf(key);
    try {
      const info = await stat(path);
      if (!info.isFile()) return null;
      return { stream: createReadStream(path), bytes: info.size };
    } catch {
      return null;
    }
  }

  /** Removes the files; one that is already gone is fine, another failure is logged. */
  async remove(...keys: string[]): Promise<void> {
    await Promise.all(
      keys.map(async (key) => {
        try {
          await rm(this.pathOf(key), { force: true });
        } catch (error) {
          this.logger.error(
            `Could not remove upload file ${key}: ${error instanceof Error ? error.message : String(error)}`,
          );
        }
      }),
    );
  }

  private pathOf(key: string): string {
    if (!STORAGE_KEY.test(key)) throw new Error(`Not an upload storage key: ${key}`);
    return join(this.config.uploadDir, key);
  }
}
