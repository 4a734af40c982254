import type { ReactNode } from 'react';
import { Layout as RaLayout } from 'react-admin';
import { AppBar } from './AppBar';
import { Menu } from './Menu';

export default function Layout({ children }: { children: ReactNode }) {
  return (
    <RaLayout appBar={AppBar} menu={Menu} appBarAlwaysOn>
      {children}
    </RaLayout>
  );
}
