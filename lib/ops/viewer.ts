import 'server-only';
import { getCurrentUser } from '@/lib/auth/current-user';
import { isStaff } from '@/lib/auth/roles';

/**
 * Whether the request comes from signed-in vendor staff, who may see the details of health and readiness
 * (latencies, queue sizes, the database's error). Anyone else, and everyone while the user cannot be loaded
 * (the database is down), gets only up or down.
 */
export async function viewerIsStaff(): Promise<boolean> {
  try {
    const user = await getCurrentUser();
    return Boolean(user && isStaff(user.role));
  } catch {
    return false;
  }
}
