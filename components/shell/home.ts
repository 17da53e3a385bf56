import type { Href } from 'expo-router';
import type { Role } from '@/shared/api/auth';

/**
 * Where a role starts (after signing in, and at "/"): growers work from
 * their growth orders; everyone else starts from the materials ("/"),
 * where families, designs and runs begin.
 */
export function homeFor(role: Role): Href {
  return role === 'grower' ? '/growth' : '/';
}
