import Box from '@mui/material/Box';
import Checkbox from '@mui/material/Checkbox';
import Radio from '@mui/material/Radio';
import Typography from '@mui/material/Typography';
import { useId, type ReactNode } from 'react';
import { tokens } from '@/theme/theme';

interface Props {
  type: 'radio' | 'checkbox';
  /** Radios of one question share a name (the arrow keys move between them). */
  name: string;
  value: string;
  checked: boolean;
  onChange: (checked: boolean) => void;
  /** The control's accessible name: short, e.g. the product's name. */
  title: string;
  /** Read after the name (aria-describedby): specs, the fit summary. */
  details?: ReactNode;
  /** Chips under the title (verdict, "Suggested"). */
  badges?: ReactNode;
  /** The price, on the right. */
  aside?: ReactNode;
  disabled?: boolean;
}

/**
 * One answer to a planner question as a card: the whole card is the label of a real radio or
 * checkbox, so a tap anywhere chooses it and the keyboard works as with any form control.
 */
export function ChoiceCard({
  type,
  name,
  value,
  checked,
  onChange,
  title,
  details,
  badges,
  aside,
  disabled,
}: Props) {
  const id = useId();
  const titleId = `${id}-title`;
  const detailsId = `${id}-details`;
  const asideId = `${id}-aside`;
  const describedBy = [details || badges ? detailsId : null, aside ? asideId : null]
    .filter(Boolean)
    .join(' ');
  const input = {
    'aria-labelledby': titleId,
    'aria-describedby': describedBy || undefined,
  };
  const control =
    type === 'radio' ? (
      <Radio
        name={name}
        value={value}
        checked={checked}
        disabled={disabled}
        onChange={(event) => {
          if (event.target.checked) onChange(true);
        }}
        slotProps={{ input }}
        sx={{ mt: -0.75, ml: -0.75 }}
      />
    ) : (
      <Checkbox
        name={name}
        value={value}
        checked={checked}
        disabled={disabled}
        onChange={(event) => onChange(event.target.checked)}
        slotProps={{ input }}
        sx={{ mt: -0.75, ml: -0.75 }}
      />
    );
  return (
    <Box
      component="label"
      sx={{
        display: 'flex',
        gap: 1,
        alignItems: 'flex-start',
        p: 1.5,
        pr: 2,
        borderRadius: 2,
        border: 2,
        borderColor: checked ? 'primary.main' : 'divider',
        bgcolor: checked ? tokens.eucalyptusMist : 'background.paper',
        cursor: disabled ? 'default' : 'pointer',
        transition: 'border-color 120ms, background-color 120ms',
        '&:hover': disabled ? undefined : { borderColor: 'primary.main' },
      }}
    >
      {control}
      <Box sx={{ flex: 1, minWidth: 0 }}>
        <Typography id={titleId} component="span" sx={{ display: 'block', fontWeight: 500 }}>
          {title}
        </Typography>
        {(details || badges) && (
          <Box id={detailsId} sx={{ mt: 0.5, display: 'grid', gap: 0.5 }}>
            {badges && <Box sx={{ display: 'flex', flexWrap: 'wrap', gap: 0.75 }}>{badges}</Box>}
            {details && (
              <Typography component="span" variant="body2" color="text.secondary">
                {details}
              </Typography>
            )}
          </Box>
        )}
      </Box>
      {aside && (
        <Box id={asideId} sx={{ textAlign: 'right', fontWeight: 500, whiteSpace: 'nowrap', pl: 1 }}>
          {aside}
        </Box>
      )}
    </Box>
  );
}
