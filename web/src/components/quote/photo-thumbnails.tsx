import Box from '@mui/material/Box';
import Link from '@mui/material/Link';
import type { QuotePhoto } from '@/types/api';

const photoKindWords: Record<QuotePhoto['kind'], string> = {
  vehicle: 'Vehicle photo',
  'tyre-placard': 'Tyre placard photo',
};

/** A quote's photos as square thumbnails, each opening the full size in a new tab. */
export function PhotoThumbnails({
  photos,
  sizePx,
}: {
  photos: readonly QuotePhoto[];
  sizePx: number;
}) {
  return (
    <Box
      component="ul"
      sx={{ listStyle: 'none', p: 0, m: 0, display: 'flex', flexWrap: 'wrap', gap: 1.5 }}
    >
      {photos.map((photo, index) => (
        <li key={photo.id}>
          <Link href={photo.url} target="_blank" rel="noopener" sx={{ display: 'block' }}>
            <Box
              component="img"
              src={photo.thumbnailUrl}
              alt={`${photoKindWords[photo.kind]} ${index + 1} (opens the full size)`}
              width={sizePx}
              height={sizePx}
              sx={{
                display: 'block',
                objectFit: 'cover',
                borderRadius: 2,
                border: 1,
                borderColor: 'divider',
              }}
            />
          </Link>
        </li>
      ))}
    </Box>
  );
}
