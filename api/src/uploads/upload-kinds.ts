/** What a customer photo shows. */
export const UPLOAD_KINDS = ['vehicle', 'tyre-placard'] as const;
export type UploadKind = (typeof UPLOAD_KINDS)[number];

/** Image formats accepted, by their content (sharp's format names). */
export const UPLOAD_IMAGE_FORMATS = ['jpeg', 'png', 'webp'] as const;
export type UploadImageFormat = (typeof UPLOAD_IMAGE_FORMATS)[number];

/** 10 MB, the largest photo accepted (multer's fileSize limit). */
export const MAX_UPLOAD_BYTES = 10 * 1024 * 1024;
