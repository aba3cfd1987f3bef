import { z } from 'zod';
import { organisationName } from './user';

export const organisationSettingsSchema = z.object({ name: organisationName });
export type OrganisationSettingsInput = z.infer<typeof organisationSettingsSchema>;
