import { createAuthClient } from 'better-auth/react';
import { adminClient, inferAdditionalFields } from 'better-auth/client/plugins';
import { ac, siteRoles } from './permissions';

export const authClient = createAuthClient({
  plugins: [
    adminClient({ ac, roles: siteRoles }),
    inferAdditionalFields({ user: { unitSystem: { type: 'string', required: false } } }),
  ],
});
