import { ConflictError } from '../errors/app-errors';

/**
 * Refuses a write based on an old read: the request carries the version it
 * read, and the row has moved on since.
 *
 * @param current the row's version now
 * @param read the version the request carries; undefined when the route does not require one
 * @throws ConflictError VERSION_CONFLICT
 */
export function assertVersion(current: number, read: number | undefined): void {
  if (read !== undefined && read !== current) {
    throw new ConflictError('VERSION_CONFLICT', `This record is at version ${current}, not ${read}: someone changed it meanwhile. Reload it and retry.`);
  }
}
