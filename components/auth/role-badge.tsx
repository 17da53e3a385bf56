import type { Role } from '@/shared/api/auth';
import { Badge, type BadgeTone } from '@/components/ui/badge';
import { roleLabels } from './permissions';

const tones: Record<Role, BadgeTone> = { admin: 'heat', physicist: 'cold', grower: 'neutral', viewer: 'neutral' };

/** The role in words (the tint only repeats it). */
export function RoleBadge({ role }: { role: Role }) {
  return <Badge label={roleLabels[role]} tone={tones[role]} />;
}
