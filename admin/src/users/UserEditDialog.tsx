import { Button, Dialog, DialogActions, DialogContent, DialogTitle, Typography } from '@mui/material';
import { Form, RadioButtonGroupInput, required, SaveButton, TextInput, useDataProvider, useNotify, useRefresh } from 'react-admin';
import type { FieldValues } from 'react-hook-form';
import { roleChoices, roleLabel } from '../auth/roles';
import { formErrorsOrNotify } from '../common/errors';
import { roleOptionText } from '../common/RoleOption';
import type { User } from '../views/sdk';

/** Name and role of one person. PUT sends the whole record, as the list protocol expects. */
export function UserEditDialog({ user, onClose }: { user: User; onClose: () => void }) {
  const dataProvider = useDataProvider();
  const notify = useNotify();
  const refresh = useRefresh();

  const submit = async (values: FieldValues) => {
    try {
      const { data } = await dataProvider.update<User>('users', {
        id: user.id,
        data: { ...user, name: String(values.name).trim(), role: values.role },
        previousData: user,
      });
      notify(data.role !== user.role ? `${data.name} is now ${roleLabel(data.role)}.` : `${data.name} saved.`, { type: 'success' });
      refresh();
      onClose();
      return undefined;
    } catch (error) {
      return formErrorsOrNotify(error, notify);
    }
  };

  return (
    <Dialog open onClose={onClose} maxWidth="xs" fullWidth aria-labelledby="user-edit-title">
      <Form onSubmit={submit} defaultValues={{ name: user.name, role: user.role }} record={user}>
        <DialogTitle id="user-edit-title">Change access</DialogTitle>
        <DialogContent sx={{ pb: 0 }}>
          <Typography variant="body2" color="text.secondary" sx={{ mb: 2 }}>
            {user.email}. A new role applies from their next request.
          </Typography>
          <TextInput source="name" label="Name" validate={required()} fullWidth />
          <RadioButtonGroupInput source="role" label="Role" choices={roleChoices} optionText={roleOptionText} row={false} validate={required()} />
        </DialogContent>
        <DialogActions sx={{ px: 3, pb: 2 }}>
          <Button onClick={onClose}>Cancel</Button>
          <SaveButton label="Save" />
        </DialogActions>
      </Form>
    </Dialog>
  );
}
