import type { Role } from '@shared/schemas/user';
import { paths } from '@/config/paths';

export interface NavItem {
  label: string;
  to: string;
  /** Name of a count shown beside the item (see app-shell's badge hooks). */
  badge?: 'reviewQueue';
  /** Other address prefixes that belong under this item, so it stays marked there too. */
  alsoOn?: string[];
}

/** Each role's navigation, in the words of the product brief. */
export const NAV: Record<Role, NavItem[]> = {
  apprentice: [
    { label: 'Today', to: paths.home },
    { label: 'Courses', to: paths.courses },
    { label: 'Calculators', to: paths.calculators },
    { label: 'Bench log', to: paths.benchLog },
    { label: 'My pieces', to: paths.myPieces },
    { label: 'My record', to: paths.myRecord },
  ],
  mentor: [
    { label: 'Today', to: paths.home },
    { label: 'To review', to: paths.reviewQueue, badge: 'reviewQueue' },
    { label: 'Classes', to: paths.classes },
    { label: 'Courses', to: paths.courses },
    { label: 'Calculators', to: paths.calculators },
  ],
  admin: [
    { label: 'Guild office', to: paths.guildOffice, alsoOn: [paths.classes] },
    { label: 'Courses', to: paths.courses },
    { label: 'Calculators', to: paths.calculators },
  ],
};
