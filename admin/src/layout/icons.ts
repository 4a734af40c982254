import ApiOutlined from '@mui/icons-material/MenuBookOutlined';
import AuditOutlined from '@mui/icons-material/ReceiptLongOutlined';
import InviteOutlined from '@mui/icons-material/ForwardToInboxOutlined';
import KeyOutlined from '@mui/icons-material/KeyOutlined';
import OverviewOutlined from '@mui/icons-material/SpaceDashboardOutlined';
import PeopleOutlined from '@mui/icons-material/PeopleAltOutlined';
import type { ComponentType } from 'react';

/** One icon per menu entry id, shared by the menu and the resource registrations. */
export const menuIcons: Record<string, ComponentType> = {
  overview: OverviewOutlined,
  users: PeopleOutlined,
  invitations: InviteOutlined,
  'audit-events': AuditOutlined,
  'api-keys': KeyOutlined,
  docs: ApiOutlined,
};
