import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Module } from '@nestjs/common';
import { User } from '../users/entities/user.entity';
import { Upload } from './entities/upload.entity';
import { UploadStorage } from './upload-storage';
import { UploadsController } from './uploads.controller';
import { UploadsService } from './uploads.service';

@Module({
  imports: [MikroOrmModule.forFeature([Upload, User])],
  controllers: [UploadsController],
  providers: [UploadsService, UploadStorage],
  exports: [UploadsService],
})
export class UploadsModule {}
