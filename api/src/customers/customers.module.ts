import { Module } from '@nestjs/common';
import { AuthModule } from '../auth/auth.module';
import { MailModule } from '../mail/mail.module';
import { UsersModule } from '../users/users.module';
import { CustomersController } from './customers.controller';
import { CustomersService } from './customers.service';

@Module({
  imports: [UsersModule, AuthModule, MailModule],
  controllers: [CustomersController],
  providers: [CustomersService],
})
export class CustomersModule {}
