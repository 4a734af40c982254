import type { ReactNode } from 'react';
import { CanAccess, Loading } from 'react-admin';
import { NoAccessPage } from './StatusPages';

/**
 * Renders a page only for people allowed to see it. react-admin's own check redirects too, but
 * only after its list query has gone out; this keeps the console from asking the API for data
 * the person may not read.
 */
export function Guarded({ resource, action = 'list', children }: { resource: string; action?: string; children: ReactNode }) {
  return (
    <CanAccess resource={resource} action={action} loading={<Loading />} accessDenied={<NoAccessPage />}>
      {children}
    </CanAccess>
  );
}
