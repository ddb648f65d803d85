export type OrganizationDto = { id: string; name: string; licenseNumber: string | null; phone: string | null; timeZone: string };
