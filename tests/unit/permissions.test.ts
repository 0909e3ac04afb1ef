import { describe, expect, it } from 'vitest';
import { can, PERMISSION_MATRIX, PERMISSIONS, ROLES } from '../../shared/permissions.js';

describe('permission matrix', () => {
  it('names only known permissions and lets every role read', () => {
    for (const r of ROLES) {
      for (const p of PERMISSION_MATRIX[r]) expect(PERMISSIONS).toContain(p);
      expect(can(r, 'read')).toBe(true);
    }
  });
  it('keeps user management with admins and approval with internals specialists', () => {
    expect(ROLES.filter((r) => can(r, 'users.manage'))).toEqual(['admin']);
    expect(ROLES.filter((r) => can(r, 'reviews.approve'))).toEqual(['internals-specialist']);
    expect(ROLES.filter((r) => can(r, 'inspections.record'))).toEqual(['inspector']);
    // field evidence is written by those who collect it: inspectors, process engineers, internals specialists
    expect(ROLES.filter((r) => can(r, 'evidence.record'))).toEqual(['process-engineer', 'internals-specialist', 'inspector']);
    expect(can(null, 'read')).toBe(false);
  });
});
