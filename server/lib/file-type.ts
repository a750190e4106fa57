import sharp from 'sharp';

/**
 * A file's type read from its bytes: `application/pdf`, or `image/<format>` for a picture sharp can
 * read (`image/jpeg`, `image/png`, `image/webp`, `image/heif`, `image/gif`…); undefined for anything else.
 */
export async function fileTypeOf(bytes: Buffer): Promise<string | undefined> {
  if (bytes.subarray(0, 5).toString('latin1') === '%PDF-') return 'application/pdf';
  try {
    const { format } = await sharp(bytes).metadata();
    return format ? `image/${format}` : undefined;
  } catch {
    return undefined;
  }
}
