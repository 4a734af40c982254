import { Suspense, type ReactNode } from 'react';
import { Layout as RaLayout } from 'react-admin';
import { DataProgress, PageLoading } from '../common/PageLoading';
import { AppBar } from './AppBar';
import { Menu } from './Menu';

export default function Layout({ children }: { children: ReactNode }) {
  return (
    <RaLayout appBar={AppBar} menu={Menu} appBarAlwaysOn>
      <DataProgress />
      {/* ours, not react-admin's: its loader stays blank for the first second of a page's code */}
      <Suspense fallback={<PageLoading />}>{children}</Suspense>
    </RaLayout>
  );
}
