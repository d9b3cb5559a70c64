/** Staff roles belong to a plant; `builder` users belong to one customer (a builder's company). */
export const STAFF_ROLES = ['admin', 'sales', 'engineer', 'foreman'] as const;
export const ROLES = [...STAFF_ROLES, 'builder'] as const;
export type StaffRole = (typeof STAFF_ROLES)[number];
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Plant manager',
  sales: 'Sales desk',
  engineer: 'Design reviewer',
  foreman: 'Shop foreman',
  builder: 'Builder',
};

export const isStaffRole = (role: Role): role is StaffRole => role !== 'builder';
