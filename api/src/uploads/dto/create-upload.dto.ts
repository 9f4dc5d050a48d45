import { ApiProperty } from '@nestjs/swagger';
import { IsIn } from 'class-validator';
import { oneOfMessage } from '../../common/decorators/field-validators';
import { UPLOAD_KINDS, type UploadKind } from '../upload-kinds';

/** The text fields of the multipart upload (the file itself is the field `photo`). */
export class CreateUploadDto {
  @ApiProperty({ enum: UPLOAD_KINDS, enumName: 'UploadKind', description: 'What the photo shows' })
  @IsIn(UPLOAD_KINDS, { message: oneOfMessage(UPLOAD_KINDS) })
  kind!: UploadKind;
}
