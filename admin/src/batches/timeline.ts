import { reasonTitle } from '../review/reasons';
import { shortRef } from './labels';

/**
 * A transition's reason as the API wrote it, made readable: ids shortened to the reference the
 * console shows, reason codes turned into words ("reading 65C13B1B rejected: Component too cold").
 */
export function readableReason(text: string): string {
  return text
    .replace(/\b[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}\b/gi, (id) => shortRef(id))
    .replace(/\b[A-Z][A-Z0-9]*(?:_[A-Z0-9]+)+\b/g, (code) => reasonTitle(code));
}
