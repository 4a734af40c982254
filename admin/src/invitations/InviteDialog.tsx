import SendOutlined from '@mui/icons-material/SendOutlined';
import { Button, Dialog, DialogActions, DialogContent, DialogTitle, Typography } from '@mui/material';
import { useState } from 'react';
import { email, Form, RadioButtonGroupInput, required, SaveButton, TextInput, useDataProvider, useNotify, useRefresh } from 'react-admin';
import type { FieldValues } from 'react-hook-form';
import { roleChoices } from '../auth/roles';
import { formErrorsOrNotify } from '../common/errors';
import { roleOptionText } from '../common/RoleOption';
import type { Invitation } from '../views/sdk';

/** "Invite someone": e-mail and role; the API sends the mail with a link to accept. */
export function InviteDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const dataProvider = useDataProvider();
  const notify = useNotify();
  const refresh = useRefresh();

  const submit = async (values: FieldValues) => {
    try {
      const name = String(values.name ?? '').trim();
      const { data } = await dataProvider.create<Invitation>('invitations', {
        data: { email: String(values.email).trim(), role: values.role, ...(name ? { name } : {}) },
      });
      notify(`Invitation sent to ${data.email ?? values.email}.`, { type: 'success' });
      refresh();
      onClose();
      return undefined;
    } catch (error) {
      return formErrorsOrNotify(error, notify);
    }
  };

  return (
    <Dialog open={open} onClose={onClose} maxWidth="xs" fullWidth aria-labelledby="invite-title">
      <Form onSubmit={submit} defaultValues={{ email: '', name: '', role: 'viewer' }}>
        <DialogTitle id="invite-title">Invite someone</DialogTitle>
        <DialogContent sx={{ pb: 0 }}>
          <Typography variant="body2" color="text.secondary" sx={{ mb: 2 }}>
            They get an e-mail with a link to choose their name and password. The link expires if unused.
          </Typography>
          <TextInput source="email" label="E-mail" type="email" validate={[required(), email()]} fullWidth autoFocus />
          <TextInput source="name" label="Name (optional)" helperText="They can change it when they accept." fullWidth />
          <RadioButtonGroupInput source="role" label="Role" choices={roleChoices} optionText={roleOptionText} row={false} validate={required()} />
        </DialogContent>
        <DialogActions sx={{ px: 3, pb: 2 }}>
          <Button onClick={onClose}>Cancel</Button>
          <SaveButton label="Send invitation" icon={<SendOutlined />} alwaysEnable />
        </DialogActions>
      </Form>
    </Dialog>
  );
}

export function InviteButton() {
  const [open, setOpen] = useState(false);
  return (
    <>
      <Button variant="contained" size="small" startIcon={<SendOutlined />} onClick={() => setOpen(true)} data-testid="invite-button">
        Invite someone
      </Button>
      {open ? <InviteDialog open onClose={() => setOpen(false)} /> : null}
    </>
  );
}
