/** The invented demo accounts seeded into "Larkspur Compute (demo)"; the README quotes these passwords. */
import type { Role } from '@shared/schemas/roles';

/** One demo account. */
export interface DemoUser {
  email: string;
  name: string;
  role: Role;
  password: string;
}

/** Demo owner, engineer and reviewer by role (invented people, .example addresses; demo only). */
export const demoUsers: Readonly<Record<Role, DemoUser>> = {
  owner: { email: 'ada.owner@larkspur.example', name: 'Ada Quillfeather', role: 'owner', password: 'larkspur-owner-demo' },
  engineer: { email: 'emil.engineer@larkspur.example', name: 'Emil Brackenridge', role: 'engineer', password: 'larkspur-engineer-demo' },
  reviewer: { email: 'rosa.reviewer@larkspur.example', name: 'Rosa Thistlewood', role: 'reviewer', password: 'larkspur-reviewer-demo' },
};

/** Name of the demo workspace. */
export const DEMO_WORKSPACE = 'Larkspur Compute (demo)';
