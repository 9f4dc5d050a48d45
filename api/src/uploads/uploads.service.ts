import type { ReadStream } from 'node:fs';
import { LockMode } from '@mikro-orm/core';
import { EntityManager } from '@mikro-orm/postgresql';
import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { FieldErrorsException } from '../common/errors/field-errors.exception';
import { User } from '../users/entities/user.entity';
import { type UploadListResponse, UploadResponse } from './dto/upload.response';
import { Upload } from './entities/upload.entity';
import { PHOTO_FIELD } from './photo-upload.interceptor';
import {
  cleanOriginalName,
  FILE_EXTENSIONS,
  MIME_TYPES,
  NOT_AN_IMAGE_REASON,
  processPhoto,
} from './photo-processing';
import { UploadStorage } from './upload-storage';
import type { UploadKind } from './upload-kinds';

export const UPLOAD_NOT_FOUND = 'No photo has this id';

/** Photos a customer may hold that are not on a quote yet. */
export const MAX_UNATTACHED_UPLOADS = 20;

/** A list answers at most this many photos, newest first. */
const LIST_LIMIT = 200;

export interface PhotoFile {
  stream: ReadStream;
  bytes: number;
  contentType: string;
}

function photoError(reason: string, message: string): FieldErrorsException {
  return new FieldErrorsException({ [PHOTO_FIELD]: [reason] }, message);
}

function tooManyUnattached(): FieldErrorsException {
  return photoError(
    `you already have ${MAX_UNATTACHED_UPLOADS} photos that are not on a quote; remove one or save the quote first`,
    `At most ${MAX_UNATTACHED_UPLOADS} photos can wait for a quote.`,
  );
}

@Injectable()
export class UploadsService {
  constructor(
    private readonly em: EntityManager,
    private readonly storage: UploadStorage,
  ) {}

  /**
   * Checks the photo by its content, stores the re-encoded original and its thumbnail, then the
   * row. Nothing is kept when any step fails: files written before a failed insert are removed.
   */
  async create(
    owner: User,
    kind: UploadKind,
    file: Express.Multer.File | undefined,
  ): Promise<UploadResponse> {
    if (!file || file.size === 0) {
      throw photoError(
        `attach a JPEG, PNG or WebP photo in the form field "${PHOTO_FIELD}"`,
        'Attach a photo to upload.',
      );
    }
    // Cheap refusal before any decoding; checked again under a lock below.
    if ((await this.unattachedCount(this.em, owner)) >= MAX_UNATTACHED_UPLOADS) {
      throw tooManyUnattached();
    }
    const checked = await processPhoto(file.buffer);
    if (!checked.ok) {
      throw photoError(
        checked.reason,
        checked.reason === NOT_AN_IMAGE_REASON
          ? 'The photo is not a JPEG, PNG or WebP image (checked by its content, not its name)'
          : `The photo ${checked.reason}`,
      );
    }
    const { photo } = checked;

    const written: string[] = [];
    try {
      const storageKey = await this.storage.write(photo.original, FILE_EXTENSIONS[photo.format]);
      written.push(storageKey);
      const thumbnailKey = await this.storage.write(photo.thumbnail, 'webp');
      written.push(thumbnailKey);

      const upload = await this.em.transactional(async (em) => {
        // One upload at a time per owner, so two at once cannot pass the limit together.
        const lockedOwner = await em.findOneOrFail(
          User,
          { id: owner.id },
          { lockMode: LockMode.PESSIMISTIC_WRITE, refresh: true },
        );
        if ((await this.unattachedCount(em, lockedOwner)) >= MAX_UNATTACHED_UPLOADS) {
          throw tooManyUnattached();
        }
        const row = new Upload({
          owner: lockedOwner,
          kind,
          format: photo.format,
          storageKey,
          thumbnailKey,
          bytes: photo.original.length,
          widthPx: photo.widthPx,
          heightPx: photo.heightPx,
        });
        row.originalName = cleanOriginalName(file.originalname);
        em.persist(row);
        return row;
      });
      return UploadResponse.from(upload);
    } catch (error) {
      await this.storage.remove(...written);
      throw error;
    }
  }

  /** The caller's own photos, newest first (optionally those on one quote). */
  async list(owner: User, quoteId?: string): Promise<UploadListResponse> {
    const uploads = await this.em.find(
      Upload,
      { owner, ...(quoteId ? { quote: quoteId } : {}) },
      { orderBy: { createdAt: 'desc', id: 'desc' }, limit: LIST_LIMIT },
    );
    return { items: uploads.map((upload) => UploadResponse.from(upload)) };
  }

  /**
   * The photo or its thumbnail for the owner or any staff member (staff see a quote's photos
   * this way). Another customer's photo is answered like an unknown id.
   */
  async file(user: User, id: string, variant: 'original' | 'thumbnail'): Promise<PhotoFile> {
    const upload = await this.em.findOne(Upload, { id });
    if (!upload || (user.role === 'customer' && upload.owner.id !== user.id)) {
      throw new NotFoundException(UPLOAD_NOT_FOUND);
    }
    const opened = await this.storage.open(
      variant === 'original' ? upload.storageKey : upload.thumbnailKey,
    );
    if (!opened) throw new NotFoundException('The file of this photo is missing');
    return {
      ...opened,
      contentType: variant === 'original' ? MIME_TYPES[upload.format] : MIME_TYPES.webp,
    };
  }

  /** The owner removes a photo that is not on a quote yet: the row, then both files. */
  async remove(owner: User, id: string): Promise<void> {
    const upload = await this.em.findOne(Upload, { id, owner });
    if (!upload) throw new NotFoundException(UPLOAD_NOT_FOUND);
    if (upload.quote) {
      throw new ConflictException(
        'This photo is on a saved quote and stays with it. Ask the workshop if it must go.',
      );
    }
    await this.em.removeAndFlush(upload);
    await this.storage.remove(upload.storageKey, upload.thumbnailKey);
  }

  private unattachedCount(em: EntityManager, owner: User): Promise<number> {
    return em.count(Upload, { owner, quote: null });
  }
}
