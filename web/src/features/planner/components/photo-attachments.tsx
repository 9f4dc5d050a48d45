import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import IconButton from '@mui/material/IconButton';
import Link from '@mui/material/Link';
import Typography from '@mui/material/Typography';
import AddAPhotoOutlined from '@mui/icons-material/AddAPhotoOutlined';
import DeleteOutline from '@mui/icons-material/DeleteOutline';
import { useQuery } from '@tanstack/react-query';
import { useId, useRef, useState } from 'react';
import { Link as RouterLink } from 'react-router';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import type { UploadKind } from '@/types/api';
import { useDeleteUpload } from '../api/delete-upload';
import { uploadsQueryOptions } from '../api/get-uploads';
import { useUploadPhoto } from '../api/upload-photo';
import type { BuildPhoto } from '../forms/build';
import { usePlanner } from '../hooks/use-planner';

const kindLabels: Record<UploadKind, string> = {
  vehicle: 'vehicle photo',
  'tyre-placard': 'tyre placard photo',
};

const ACCEPTED_TYPES = 'image/jpeg,image/png,image/webp';

function uploadErrorText(error: unknown): string {
  if (!isApiError(error)) return 'The photo could not be sent. Please try again.';
  const fieldMessages = Object.values(error.fieldErrors).flat();
  if (fieldMessages.length > 0) return `The photo ${fieldMessages.join(' ')}`.replace(/\s+/g, ' ');
  return error.message;
}

/**
 * Photos for the workshop (the vehicle, the tyre placard), kept with the build and attached
 * when the quote is saved. Only signed-in customers can send photos.
 */
export function PhotoAttachments({ returnTo }: { returnTo: string }) {
  const { build, config, addPhoto, removePhoto } = usePlanner();
  const headingId = useId();
  const statusId = useId();
  const signedInCustomer = config.viewerRole === 'customer';
  const uploads = useQuery({ ...uploadsQueryOptions(), enabled: signedInCustomer });
  const upload = useUploadPhoto();
  const remove = useDeleteUpload();
  const inputRef = useRef<HTMLInputElement>(null);
  const [pendingKind, setPendingKind] = useState<UploadKind>('vehicle');
  const [error, setError] = useState<string | null>(null);
  const [status, setStatus] = useState('');

  // Only photos still on the server and not yet on a quote (another tab may have used them).
  const available = uploads.data
    ? build.photos.filter((photo) =>
        uploads.data.items.some((item) => item.id === photo.id && item.quoteId === null),
      )
    : build.photos;

  const pick = (kind: UploadKind) => {
    setPendingKind(kind);
    setError(null);
    inputRef.current?.click();
  };

  const send = (file: File) => {
    setStatus(`Sending the ${kindLabels[pendingKind]}…`);
    upload.mutate(
      { file, kind: pendingKind },
      {
        onSuccess: (saved) => {
          const photo: BuildPhoto = {
            id: saved.id,
            kind: saved.kind,
            thumbnailUrl: saved.thumbnailUrl,
          };
          addPhoto(photo);
          setStatus(`The ${kindLabels[saved.kind]} was added.`);
        },
        onError: (failure) => {
          setStatus('');
          setError(uploadErrorText(failure));
        },
      },
    );
  };

  const drop = (photo: BuildPhoto, label: string) => {
    setError(null);
    remove.mutate(photo.id, {
      onSuccess: () => {
        removePhoto(photo.id);
        setStatus(`${label} was removed.`);
      },
      onError: (failure) => {
        // Already gone on the server: forget it here too.
        if (isApiError(failure) && failure.statusCode === 404) removePhoto(photo.id);
        else setError(isApiError(failure) ? failure.message : 'The photo could not be removed.');
      },
    });
  };

  if (config.mode !== 'customer') return null;

  return (
    <Box component="section" aria-labelledby={headingId}>
      <Typography id={headingId} variant="h2" sx={{ mb: 0.5 }}>
        Photos for the workshop
      </Typography>
      {!signedInCustomer ? (
        <Typography color="text.secondary">
          <Link component={RouterLink} to={paths.auth.signIn.getHref(returnTo)}>
            Sign in
          </Link>{' '}
          or{' '}
          <Link component={RouterLink} to={paths.auth.register.getHref(returnTo)}>
            register
          </Link>{' '}
          to add photos of your vehicle and its tyre placard.
        </Typography>
      ) : (
        <>
          <Typography color="text.secondary" sx={{ mb: 1.5 }}>
            Optional: a photo of the vehicle and of the tyre placard (inside the driver&apos;s door)
            help the workshop check the quote. JPEG, PNG or WebP, up to 10 MB each.
          </Typography>
          <input
            ref={inputRef}
            type="file"
            accept={ACCEPTED_TYPES}
            hidden
            aria-hidden
            tabIndex={-1}
            onChange={(event) => {
              const file = event.target.files?.[0];
              event.target.value = '';
              if (file) send(file);
            }}
          />
          <Box sx={{ display: 'flex', flexWrap: 'wrap', gap: 1 }}>
            <Button
              variant="outlined"
              startIcon={<AddAPhotoOutlined aria-hidden />}
              onClick={() => pick('vehicle')}
              disabled={upload.isPending}
            >
              Add a vehicle photo
            </Button>
            <Button
              variant="outlined"
              startIcon={<AddAPhotoOutlined aria-hidden />}
              onClick={() => pick('tyre-placard')}
              disabled={upload.isPending}
            >
              Add a tyre placard photo
            </Button>
          </Box>
          <Typography
            id={statusId}
            role="status"
            variant="body2"
            sx={{ mt: 1, minHeight: '1.5em' }}
          >
            {status}
          </Typography>
          {error && (
            <Alert severity="error" sx={{ mt: 1 }}>
              {error}
            </Alert>
          )}
          {available.length > 0 && (
            <Box
              component="ul"
              sx={{
                listStyle: 'none',
                p: 0,
                m: 0,
                mt: 1.5,
                display: 'flex',
                flexWrap: 'wrap',
                gap: 1.5,
              }}
            >
              {available.map((photo, index) => {
                const label = `${kindLabels[photo.kind].replace(/^./, (first) => first.toUpperCase())} ${index + 1}`;
                return (
                  <Box component="li" key={photo.id} sx={{ position: 'relative' }}>
                    <Box
                      component="img"
                      src={photo.thumbnailUrl}
                      alt={label}
                      width={112}
                      height={112}
                      sx={{
                        display: 'block',
                        objectFit: 'cover',
                        borderRadius: 2,
                        border: 1,
                        borderColor: 'divider',
                        bgcolor: 'background.paper',
                      }}
                    />
                    <IconButton
                      aria-label={`Remove ${label.toLowerCase()}`}
                      onClick={() => drop(photo, label)}
                      disabled={remove.isPending}
                      size="small"
                      sx={{
                        position: 'absolute',
                        top: 4,
                        right: 4,
                        bgcolor: 'background.paper',
                        '&:hover': { bgcolor: 'background.paper' },
                      }}
                    >
                      <DeleteOutline fontSize="small" />
                    </IconButton>
                  </Box>
                );
              })}
            </Box>
          )}
        </>
      )}
    </Box>
  );
}
