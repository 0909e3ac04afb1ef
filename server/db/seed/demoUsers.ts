import type { Role } from '../../../shared/permissions.js';
import demo from './demo-users.json' with { type: 'json' };

/** Demo sign-ins printed by npm start. Invented people; change or deactivate them on any shared install. */
export const DEMO_PASSWORD: string = demo.password;
export const DEMO_USERS = demo.users as { email: string; name: string; role: Role }[];
