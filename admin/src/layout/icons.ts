import ApiOutlined from '@mui/icons-material/MenuBookOutlined';
import AuditOutlined from '@mui/icons-material/ReceiptLongOutlined';
import InviteOutlined from '@mui/icons-material/ForwardToInboxOutlined';
import KeyOutlined from '@mui/icons-material/KeyOutlined';
import OverviewOutlined from '@mui/icons-material/SpaceDashboardOutlined';
import PeopleOutlined from '@mui/icons-material/PeopleAltOutlined';
import DevicesOutlined from '@mui/icons-material/ScaleOutlined';
import WebhookOutlined from '@mui/icons-material/WebhookOutlined';
import DeliveriesOutlined from '@mui/icons-material/OutboxOutlined';
import SystemsOutlined from '@mui/icons-material/ScienceOutlined';
import LotsOutlined from '@mui/icons-material/Inventory2Outlined';
import MoldsOutlined from '@mui/icons-material/ViewInArOutlined';
import WorkOrdersOutlined from '@mui/icons-material/AssignmentOutlined';
import CupTestsOutlined from '@mui/icons-material/LocalDrinkOutlined';
import ProfileOutlined from '@mui/icons-material/AccountCircleOutlined';
import ReviewOutlined from '@mui/icons-material/FactCheckOutlined';
import BatchesOutlined from '@mui/icons-material/BlenderOutlined';
import CalculatorOutlined from '@mui/icons-material/CalculateOutlined';
import ImportsOutlined from '@mui/icons-material/UploadFileOutlined';
import ReadingLogOutlined from '@mui/icons-material/ListAltOutlined';
import LiveOutlined from '@mui/icons-material/SensorsOutlined';
import ControlOutlined from '@mui/icons-material/TimelineOutlined';
import DefectsOutlined from '@mui/icons-material/BarChartOutlined';
import type { ComponentType } from 'react';

/** One icon per menu entry id, shared by the menu and the resource registrations. */
export const menuIcons: Record<string, ComponentType> = {
  overview: OverviewOutlined,
  users: PeopleOutlined,
  invitations: InviteOutlined,
  'audit-events': AuditOutlined,
  'api-keys': KeyOutlined,
  docs: ApiOutlined,
  devices: DevicesOutlined,
  'webhook-endpoints': WebhookOutlined,
  'webhook-deliveries': DeliveriesOutlined,
  'material-systems': SystemsOutlined,
  lots: LotsOutlined,
  molds: MoldsOutlined,
  'work-orders': WorkOrdersOutlined,
  'qc-cup-tests': CupTestsOutlined,
  profile: ProfileOutlined,
  readings: ReviewOutlined,
  batches: BatchesOutlined,
  calculator: CalculatorOutlined,
  defects: DefectsOutlined,
  imports: ImportsOutlined,
  'reading-log': ReadingLogOutlined,
  live: LiveOutlined,
  control: ControlOutlined,
};
