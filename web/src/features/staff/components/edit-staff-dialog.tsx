import Dialog from '@mui/material/Dialog';
import DialogTitle from '@mui/material/DialogTitle';
import type { StaffMember } from '@/types/api';
import { EditStaffForm } from '../forms/edit-staff-form';

interface Props {
  open: boolean;
  /** Kept while the dialog fades out, then cleared through onExited. */
  member: StaffMember | null;
  currentUserId: string;
  onClose: () => void;
  onExited: () => void;
}

export function EditStaffDialog({ open, member, currentUserId, onClose, onExited }: Props) {
  return (
    <Dialog
      open={open && member !== null}
      onClose={onClose}
      fullWidth
      maxWidth="xs"
      slotProps={{ transition: { onExited } }}
    >
      {member && (
        <>
          <DialogTitle>Edit {member.name}</DialogTitle>
          <EditStaffForm
            key={member.id}
            member={member}
            isSelf={member.id === currentUserId}
            onCancel={onClose}
            onSaved={onClose}
          />
        </>
      )}
    </Dialog>
  );
}
