import { ApiProperty } from '@nestjs/swagger';
import type { Upload } from '../entities/upload.entity';
import {
  UPLOAD_IMAGE_FORMATS,
  UPLOAD_KINDS,
  type UploadImageFormat,
  type UploadKind,
} from '../upload-kinds';

export function uploadUrl(id: string): string {
  return `/api/uploads/${id}`;
}

export function thumbnailUrl(id: string): string {
  return `/api/uploads/${id}/thumbnail`;
}

export class UploadResponse {
  @ApiProperty({ format: 'uuid' })
  id!: string;

  @ApiProperty({ enum: UPLOAD_KINDS, enumName: 'UploadKind' })
  kind!: UploadKind;

  @ApiProperty({
    enum: UPLOAD_IMAGE_FORMATS,
    enumName: 'UploadImageFormat',
    description: 'Read from the content',
  })
  format!: UploadImageFormat;

  @ApiProperty({ description: 'Size of the stored (re-encoded) photo in bytes' })
  bytes!: number;

  @ApiProperty()
  widthPx!: number;

  @ApiProperty()
  heightPx!: number;

  @ApiProperty({ description: 'The file name the browser sent, cleaned; for display only' })
  originalName!: string;

  @ApiProperty({ type: String, format: 'date-time' })
  createdAt!: string;

  @ApiProperty({
    type: String,
    format: 'uuid',
    nullable: true,
    description: 'The quote it is on (null until a quote is saved with it)',
  })
  quoteId!: string | null;

  @ApiProperty({ example: '/api/uploads/00000000-0000-4000-8000-000000000000' })
  url!: string;

  @ApiProperty({ example: '/api/uploads/00000000-0000-4000-8000-000000000000/thumbnail' })
  thumbnailUrl!: string;

  static from(upload: Upload): UploadResponse {
    return Object.assign(new UploadResponse(), {
      id: upload.id,
      kind: upload.kind,
      format: upload.format,
      bytes: upload.bytes,
      widthPx: upload.widthPx,
      heightPx: upload.heightPx,
      originalName: upload.originalName,
      createdAt: upload.createdAt.toISOString(),
      quoteId: upload.quote?.id ?? null,
      url: uploadUrl(upload.id),
      thumbnailUrl: thumbnailUrl(upload.id),
    });
  }
}

export class UploadListResponse {
  @ApiProperty({ type: [UploadResponse] })
  items!: UploadResponse[];
}
