import { createContext, useCallback, useContext, useMemo, useState, type ReactNode } from 'react';
import { useRefresh } from 'react-admin';
import type { ApiKey, ApiKeyKind } from '../views/sdk';
import { CreateKeyDialog } from './CreateKeyDialog';
import { RotateKeyDialog } from './RotateKeyDialog';

interface KeyDialogs {
  issue(): void;
  rotate(key: ApiKey): void;
}

const KeyDialogsContext = createContext<KeyDialogs | null>(null);

/**
 * Holds the issue and rotate dialogs above the list. A dialog showing a secret must outlive the
 * row or empty state that opened it, so it lives here, and the list refreshes only when it closes.
 */
export function KeyDialogsProvider({ kinds, children }: { kinds: ApiKeyKind[]; children: ReactNode }) {
  const [open, setOpen] = useState<{ type: 'issue' } | { type: 'rotate'; key: ApiKey } | null>(null);
  const refresh = useRefresh();
  const close = useCallback(
    (changed: boolean) => {
      setOpen(null);
      if (changed) refresh();
    },
    [refresh],
  );
  const value = useMemo<KeyDialogs>(() => ({ issue: () => setOpen({ type: 'issue' }), rotate: (key) => setOpen({ type: 'rotate', key }) }), []);
  return (
    <KeyDialogsContext.Provider value={value}>
      {children}
      {open?.type === 'issue' ? <CreateKeyDialog kinds={kinds} onClose={close} /> : null}
      {open?.type === 'rotate' ? <RotateKeyDialog apiKey={open.key} onClose={close} /> : null}
    </KeyDialogsContext.Provider>
  );
}

export function useKeyDialogs(): KeyDialogs {
  const ctx = useContext(KeyDialogsContext);
  if (!ctx) throw new Error('useKeyDialogs outside KeyDialogsProvider');
  return ctx;
}
