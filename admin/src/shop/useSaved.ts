import { useNotify, useRedirect, type RaRecord, type RedirectionSideEffect } from 'react-admin';

/**
 * Mutation options for a Create or Edit page: a notice in our own words instead of the generic
 * "Element created", then the page to go to.
 */
export function useSaved<T extends RaRecord = RaRecord>(resource: string, message: (record: T) => string, to: RedirectionSideEffect = 'list') {
  const notify = useNotify();
  const redirect = useRedirect();
  return {
    onSuccess: (record: T) => {
      notify(message(record), { type: 'success' });
      redirect(to, resource, record.id, record);
    },
  };
}
