/**
 * The service has no authentication of its own: anyone who can reach its port can read,
 * replace and delete the stored hulls. Bound to the loopback interface only the machine
 * itself can; bound to anything else it says so in the log, once, at start. README
 * ("Exposing the service") says to put a reverse proxy with authentication in front.
 */
import { isIP } from 'node:net';

/** True for an address or name of the loopback interface (127.0.0.0/8, ::1, localhost). */
export function isLoopback(host: string): boolean {
  const h = host.trim().toLowerCase().replace(/^\[|\]$/g, '');
  if (h === 'localhost' || h.endsWith('.localhost')) return true;
  if (isIP(h) === 4) return h.startsWith('127.');
  if (h === '::1' || h === '0:0:0:0:0:0:0:1') return true;
  return h.startsWith('::ffff:127.');
}

/** The warning to log for a listening address, or undefined on loopback. */
export function bindWarning(host: string): string | undefined {
  if (isLoopback(host)) return undefined;
  return `listening on ${host}, not on loopback only: this service has no authentication, so anyone who can reach this port can read, replace and delete the stored hulls; put a reverse proxy with authentication in front of it (README, "Exposing the service")`;
}
