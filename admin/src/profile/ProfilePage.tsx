import LockResetOutlined from '@mui/icons-material/LockResetOutlined';
import { Alert, Box, Typography } from '@mui/material';
import { useEffect, useState } from 'react';
import { Form, Loading, PasswordInput, RadioButtonGroupInput, required, SaveButton, TextInput, Title, useDataProvider, useNotify } from 'react-admin';
import type { FieldValues } from 'react-hook-form';
import { roleLabel, ROLE_INFO } from '../auth/roles';
import type { Profile } from '../views/sdk';
import { formErrorsOrNotify } from '../common/errors';
import { PageHeader } from '../common/PageHeader';
import type { PourgateDataProvider } from '../dataProvider';
import { Section, DetailGrid } from '../shop/DetailGrid';
import { DRIFT_CHOICES, NOTIFY_CHOICES, UNIT_CHOICES, preferencesPatch, passwordPatch } from './profileRules';

export default function ProfilePage() {
  const dataProvider = useDataProvider<PourgateDataProvider>();
  const notify = useNotify();
  const [me, setMe] = useState<Profile | null>(null);
  const [passwordSaved, setPasswordSaved] = useState(false);
  const [formKey, setFormKey] = useState(0);
  useEffect(() => {
    let live = true;
    dataProvider.getProfile().then(
      ({ data }) => live && setMe(data),
      (e: Error) => notify(e.message, { type: 'error' }),
    );
    return () => {
      live = false;
    };
  }, [dataProvider, notify]);
  if (!me) return <Loading />;

  const savePreferences = async (values: FieldValues) => {
    const patch = preferencesPatch({ fullName: me.name, unitSystem: me.unitSystem, notifyRejections: me.notifyRejections, notifyDrift: me.notifyDrift }, values);
    if (!patch) {
      notify('Nothing changed.', { type: 'info' });
      return undefined;
    }
    try {
      const { data } = await dataProvider.updateProfile(patch);
      setMe(data);
      notify('Profile saved.', { type: 'success' });
      return undefined;
    } catch (error) {
      return formErrorsOrNotify(error, notify);
    }
  };

  const savePassword = async (values: FieldValues) => {
    const patch = passwordPatch(values);
    if ('errors' in patch) return patch.errors;
    try {
      await dataProvider.updateProfile(patch);
      setPasswordSaved(true);
      setFormKey((k) => k + 1);
      return undefined;
    } catch (error) {
      return formErrorsOrNotify(error, notify);
    }
  };

  return (
    <Box sx={{ maxWidth: 860 }}>
      <Title title="Your profile" />
      <PageHeader title="Your profile" lead="Your name, the units Pourgate shows you, and the mail you get about rejected readings." />
      <Section title="Account">
        <DetailGrid
          items={[
            { label: 'E-mail', value: me.email, testId: 'profile-email' },
            { label: 'Role', value: <span title={ROLE_INFO[me.role]?.blurb}>{roleLabel(me.role)}</span>, testId: 'profile-role' },
            { label: 'Organization', value: me.organization?.name },
          ]}
        />
        <Typography variant="caption" color="text.secondary" component="p" sx={{ mt: 1.5 }}>
          An IT admin of your organization changes roles and e-mail addresses.
        </Typography>
      </Section>
      <Section title="Name and preferences">
        <Form onSubmit={savePreferences} record={{ name: me.name, unitSystem: me.unitSystem, notifyRejections: me.notifyRejections, notifyDrift: me.notifyDrift }}>
          <TextInput source="name" label="Name" validate={required()} sx={{ maxWidth: 420 }} fullWidth />
          <RadioButtonGroupInput source="unitSystem" label="Units on screens and pour sheets" choices={UNIT_CHOICES} />
          {/* engineers are the ones mailed about rejections and drift */}
          {me.role === 'engineer' ? (
            <>
              <RadioButtonGroupInput source="notifyRejections" label="E-mail about rejected readings" choices={NOTIFY_CHOICES} row={false} data-testid="notify-rejections" />
              <RadioButtonGroupInput source="notifyDrift" label="E-mail about drift on control charts" choices={DRIFT_CHOICES} row={false} data-testid="notify-drift" />
            </>
          ) : null}
          <Box sx={{ mt: 1 }}>
            <SaveButton label="Save preferences" />
          </Box>
        </Form>
      </Section>
      <Section title="Password">
        {passwordSaved ? (
          <Alert severity="success" sx={{ mb: 2 }} onClose={() => setPasswordSaved(false)}>
            Password changed. Your other sessions stay signed in until they next renew.
          </Alert>
        ) : null}
        <Form key={formKey} onSubmit={savePassword} defaultValues={{ currentPassword: '', newPassword: '', confirmPassword: '' }}>
          <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', md: '1fr 1fr 1fr' }, columnGap: 2 }}>
            <PasswordInput source="currentPassword" label="Current password" validate={required()} autoComplete="current-password" />
            <PasswordInput source="newPassword" label="New password" validate={required()} autoComplete="new-password" helperText="At least 10 characters" />
            <PasswordInput source="confirmPassword" label="New password again" validate={required()} autoComplete="new-password" />
          </Box>
          <SaveButton label="Change password" icon={<LockResetOutlined />} />
        </Form>
      </Section>
    </Box>
  );
}
