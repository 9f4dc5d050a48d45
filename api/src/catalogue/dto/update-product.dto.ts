import { PartialType } from '@nestjs/swagger';
import { CreateProductDto } from './create-product.dto';

/** Any of the product's fields; the merged product is validated again as a whole. */
export class UpdateProductDto extends PartialType(CreateProductDto) {}
