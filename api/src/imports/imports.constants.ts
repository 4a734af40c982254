export const IMPORT_QUEUE = 'reading-imports';

/** Largest CSV accepted (bytes): a logger's export of a shift is a few hundred kB. */
export const MAX_IMPORT_BYTES = 5 * 1024 * 1024;
/** Rows checked and written per step; progress is updated after each. */
export const IMPORT_CHUNK_ROWS = 250;
/** Bad rows listed in full; beyond this only counted. */
export const MAX_LISTED_BAD_ROWS = 500;

/** The columns of a logger CSV, in the header row, any order; the required ones first. */
export const CSV_REQUIRED = ['client_reading_id', 'batch_id', 'quantity', 'subject'] as const;
export const CSV_OPTIONAL = ['device_id', 'device_time', 'value', 'unit', 'stable'] as const;

export interface ImportJob {
  importId: string;
}
