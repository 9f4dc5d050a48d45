import Avatar from '@mui/material/Avatar';
import Box from '@mui/material/Box';
import Divider from '@mui/material/Divider';
import IconButton from '@mui/material/IconButton';
import ListItemIcon from '@mui/material/ListItemIcon';
import MenuItem from '@mui/material/MenuItem';
import MenuList from '@mui/material/MenuList';
import Popover from '@mui/material/Popover';
import Snackbar from '@mui/material/Snackbar';
import Typography from '@mui/material/Typography';
import LogoutIcon from '@mui/icons-material/Logout';
import { useId, useState } from 'react';
import { roleLabels } from '@/config/roles';
import type { User } from '@/types/api';
import { useSignOut } from '../api/sign-out';

function initialsOf(name: string): string {
  const parts = name.trim().split(/\s+/).filter(Boolean);
  const letters = parts.length > 1 ? [parts[0], parts[parts.length - 1]] : parts;
  return letters.map((part) => part[0]?.toUpperCase() ?? '').join('') || '?';
}

/** The app bar's account button: who is signed in, and "Sign out". */
export function UserMenu({ user }: { user: User }) {
  const [anchor, setAnchor] = useState<HTMLElement | null>(null);
  const [failed, setFailed] = useState(false);
  const signOut = useSignOut();
  const id = useId();
  const buttonId = `${id}-button`;
  const menuId = `${id}-menu`;
  const open = anchor !== null;

  const close = () => setAnchor(null);
  const handleSignOut = () => {
    close();
    signOut.mutate(undefined, { onError: () => setFailed(true) });
  };

  return (
    <>
      <IconButton
        id={buttonId}
        aria-label="Account menu"
        aria-haspopup="menu"
        aria-controls={open ? menuId : undefined}
        aria-expanded={open || undefined}
        onClick={(event) => setAnchor(event.currentTarget)}
        sx={{ p: 0.5 }}
      >
        <Avatar
          aria-hidden
          sx={{
            width: 36,
            height: 36,
            fontSize: '0.95rem',
            fontWeight: 500,
            bgcolor: 'secondary.main',
            color: 'secondary.contrastText',
          }}
        >
          {initialsOf(user.name)}
        </Avatar>
      </IconButton>
      <Popover
        open={open}
        anchorEl={anchor}
        onClose={close}
        anchorOrigin={{ vertical: 'bottom', horizontal: 'right' }}
        transformOrigin={{ vertical: 'top', horizontal: 'right' }}
        slotProps={{ paper: { sx: { minWidth: 240, mt: 1 } } }}
      >
        <Box sx={{ px: 2, pt: 1.5, pb: 1 }}>
          <Typography sx={{ fontWeight: 500 }}>{user.name}</Typography>
          <Typography variant="body2" color="text.secondary" sx={{ wordBreak: 'break-all' }}>
            {user.email}
          </Typography>
          <Typography variant="body2" color="text.secondary">
            {roleLabels[user.role]}
          </Typography>
        </Box>
        <Divider />
        <MenuList id={menuId} aria-labelledby={buttonId} autoFocusItem={open}>
          <MenuItem onClick={handleSignOut} disabled={signOut.isPending}>
            <ListItemIcon>
              <LogoutIcon fontSize="small" />
            </ListItemIcon>
            Sign out
          </MenuItem>
        </MenuList>
      </Popover>
      <Snackbar
        open={failed}
        autoHideDuration={6000}
        onClose={() => setFailed(false)}
        message="Could not sign out. Check your connection and try again."
      />
    </>
  );
}
