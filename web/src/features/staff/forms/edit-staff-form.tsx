import Button from '@mui/material/Button';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import { Formik } from 'formik';
import * as yup from 'yup';
import { FormAlert } from '@/components/ui/form-alert';
import { FormSelectField } from '@/components/ui/form-select-field';
import { FormSwitchField } from '@/components/ui/form-switch-field';
import { FormTextField } from '@/components/ui/form-text-field';
import { FormikForm } from '@/components/ui/formik-form';
import { SubmitButton } from '@/components/ui/submit-button';
import { applyApiErrorToForm } from '@/lib/form-errors';
import type { StaffMember, UpdateStaffRequest } from '@/types/api';
import { useUpdateStaff } from '../api/update-staff';
import { staffNameField, staffRoleField, staffRoleOptions } from './staff-fields';

/** Mirrors the server's update-staff DTO: name, role and active, each optional there. */
export const editStaffSchema = yup.object({
  name: staffNameField,
  role: staffRoleField,
  active: yup.boolean().required(),
});

type EditStaffValues = yup.InferType<typeof editStaffSchema>;
const fields = ['name', 'role', 'active'] as const;

interface Props {
  member: StaffMember;
  /** Editing one's own account: role and active stay as they are (the server refuses too). */
  isSelf: boolean;
  onCancel: () => void;
  onSaved: () => void;
}

/** The edit dialog's body. Only changed fields are sent. */
export function EditStaffForm({ member, isSelf, onCancel, onSaved }: Props) {
  const updateStaff = useUpdateStaff();
  return (
    <Formik<EditStaffValues>
      initialValues={{ name: member.name, role: member.role, active: member.active }}
      validationSchema={editStaffSchema}
      onSubmit={async (values, helpers) => {
        helpers.setStatus(undefined);
        const changes: UpdateStaffRequest = {};
        const name = values.name.trim();
        if (name !== member.name) changes.name = name;
        if (values.role !== member.role) changes.role = values.role;
        if (values.active !== member.active) changes.active = values.active;
        if (Object.keys(changes).length === 0) {
          onSaved();
          return;
        }
        try {
          await updateStaff.mutateAsync({ id: member.id, changes });
          onSaved();
        } catch (error) {
          applyApiErrorToForm(error, helpers, values, fields);
        }
      }}
    >
      <FormikForm>
        <DialogContent sx={{ pt: 0 }}>
          <FormAlert />
          <FormTextField name="name" label="Name" autoComplete="off" />
          <FormSelectField
            name="role"
            label="Role"
            options={staffRoleOptions}
            disabled={isSelf}
            helperText={isSelf ? 'You cannot change your own role.' : undefined}
          />
          <FormSwitchField
            name="active"
            label="Active"
            disabled={isSelf}
            helperText={
              isSelf
                ? 'You cannot deactivate your own account.'
                : 'An inactive account cannot sign in.'
            }
          />
        </DialogContent>
        <DialogActions sx={{ px: 3, pb: 2.5 }}>
          <Button onClick={onCancel}>Cancel</Button>
          <SubmitButton size="medium">Save changes</SubmitButton>
        </DialogActions>
      </FormikForm>
    </Formik>
  );
}
