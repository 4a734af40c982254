import { lazy } from 'react';
import { menuIcons } from '../layout/icons';
import type { Device } from './deviceRules';

export default {
  list: lazy(() => import('./DeviceList')),
  create: lazy(() => import('./DeviceForm').then((m) => ({ default: m.DeviceCreate }))),
  edit: lazy(() => import('./DeviceForm').then((m) => ({ default: m.DeviceEdit }))),
  icon: menuIcons.devices,
  recordRepresentation: (d: Device) => `${d.name} · ${d.serial}`,
  options: { label: 'Devices' },
};
