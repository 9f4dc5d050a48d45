import { EmailField } from './email.field';

export class RequestPasswordResetDto {
  @EmailField()
  email!: string;
}
