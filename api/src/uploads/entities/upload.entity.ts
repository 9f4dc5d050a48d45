import { Check, Entity, Enum, ManyToOne, Property } from '@mikro-orm/core';
import { BaseEntity } from '../../database/base.entity';
import { Quote } from '../../quotes/entities/quote.entity';
import { User } from '../../users/entities/user.entity';
import {
  UPLOAD_IMAGE_FORMATS,
  UPLOAD_KINDS,
  type UploadImageFormat,
  type UploadKind,
} from '../upload-kinds';

/**
 * A photo a customer attached (vehicle, tyre placard). The file and its thumbnail live in the
 * upload directory under random names, outside the web root; they are served only through the
 * authorised handler.
 */
@Entity()
@Check({ name: 'upload_bytes_check', expression: 'bytes > 0' })
export class Upload extends BaseEntity<'quote' | 'originalName'> {
  @ManyToOne(() => User, { deleteRule: 'cascade', index: true })
  owner: User;

  /** The quote it was attached to (null while it belongs only to the build). */
  @ManyToOne(() => Quote, { deleteRule: 'set null', nullable: true, index: true })
  quote: Quote | null = null;

  @Enum({ items: () => [...UPLOAD_KINDS], type: 'string' })
  kind: UploadKind;

  /** The format read from the content. */
  @Enum({ items: () => [...UPLOAD_IMAGE_FORMATS], type: 'string' })
  format: UploadImageFormat;

  /** Random file name of the original in the upload directory. */
  @Property({ type: 'string', length: 80, unique: true })
  storageKey: string;

  /** Random file name of the thumbnail. */
  @Property({ type: 'string', length: 80, unique: true })
  thumbnailKey: string;

  @Property({ type: 'integer' })
  bytes: number;

  @Property({ type: 'integer' })
  widthPx: number;

  @Property({ type: 'integer' })
  heightPx: number;

  /** The name the browser sent, cleaned, for display only. */
  @Property({ type: 'string', length: 120, default: '' })
  originalName: string = '';

  constructor(fields: {
    owner: User;
    kind: UploadKind;
    format: UploadImageFormat;
    storageKey: string;
    thumbnailKey: string;
    bytes: number;
    widthPx: number;
    heightPx: number;
  }) {
    super();
    this.owner = fields.owner;
    this.kind = fields.kind;
    this.format = fields.format;
    this.storageKey = fields.storageKey;
    this.thumbnailKey = fields.thumbnailKey;
    this.bytes = fields.bytes;
    this.widthPx = fields.widthPx;
    this.heightPx = fields.heightPx;
  }
}
