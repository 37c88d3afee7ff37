import { describe, expect, it } from 'vitest';
import { can, roles } from '@shared/permissions';
import { substrateWording } from '@/features/assays/utils/assay-words';
import { filtersFromSearch, filtersToSearch } from '@/features/audit/utils/audit-filters';
import { whereToStart } from '@/features/home/utils/where-to-start';
import { invitableRoles } from '@/features/invitations/utils/invitable-roles';

describe('audit filters in the address', () => {
  it('when the address holds filters, then each known one is read, trimmed', () => {
    const search = new URLSearchParams(
      'entity=user&action=+sign-in+&actorId=u1&from=2025-03-01&to=2025-03-31&x=1',
    );
    expect(filtersFromSearch(search)).toEqual({
      entity: 'user',
      action: 'sign-in',
      actorId: 'u1',
      from: '2025-03-01',
      to: '2025-03-31',
    });
  });

  it('when a date is not a day (yyyy-mm-dd) or a value is blank, then it is ignored', () => {
    const search = new URLSearchParams('from=1/3/2025&to=2025-03-31T10:00&entity=%20&action=');
    expect(filtersFromSearch(search)).toEqual({});
  });

  it('when filters are written back with a page offset, then empty ones are left out and a zero offset too', () => {
    expect(filtersToSearch({ entity: 'team', action: '', from: '2025-01-01' }, 50)).toEqual({
      entity: 'team',
      from: '2025-01-01',
      offset: '50',
    });
    expect(filtersToSearch({ entity: 'team' })).toEqual({ entity: 'team' });
  });

  it('when filters go to the address and back, then they are the same', () => {
    const filters = { entity: 'invitation', actorId: 'abc', to: '2026-12-01' };
    expect(filtersFromSearch(new URLSearchParams(filtersToSearch(filters, 25)))).toEqual(filters);
  });
});

describe('who may be invited', () => {
  it('when an admin invites, then every role may be given', () => {
    expect([...invitableRoles('admin')]).toEqual([...roles]);
  });

  it('when a lead invites, then any role but admin may be given (as the server rules)', () => {
    expect(invitableRoles('lead')).toEqual(['lead', 'scientist', 'viewer']);
  });

  it('when a role may not create invitations at all, then it may give no role', () => {
    for (const role of roles) {
      expect(invitableRoles(role).length > 0).toBe(can(role, 'invitations:create'));
    }
  });
});

describe('where to start', () => {
  it('when someone outside every team signs in, then the only step is to ask to join one, admins aside', () => {
    for (const role of ['lead', 'scientist', 'viewer'] as const) {
      const steps = whereToStart(role, false);
      expect(steps).toHaveLength(1);
      expect(steps[0].title).toContain('team');
    }
    expect(whereToStart('admin', false)).toEqual(whereToStart('admin', true));
  });

  it('when a scientist starts, then the steps follow the work: enzyme, assay, buffer series, study', () => {
    expect(whereToStart('scientist', true).map((s) => s.linkLabel)).toEqual([
      'Enzymes',
      'New assay',
      'Design a series',
      'New study',
    ]);
  });

  it('when a viewer starts, then no step asks them to create anything', () => {
    const steps = whereToStart('viewer', true);
    expect(steps.length).toBeGreaterThan(0);
    for (const s of steps) expect(s.href).not.toMatch(/new/);
  });

  it('when any role starts, then every step links inside the app', () => {
    for (const role of roles) {
      for (const s of whereToStart(role, true)) expect(s.href.startsWith('/')).toBe(true);
    }
  });
});

// [S] ≥ 10·KM counts as ≫ and ≤ 0.1·KM as ≪ (common practice, no source); what each regime
// reports is SCIENCE.md §1.6 (kcat against kcat/KM).
describe('the substrate regime in words', () => {
  it('when the substrate is saturating and [S]/KM is at least 10, then kcat is reported without caution', () => {
    const w = substrateWording({ substrateRegime: 'saturating', substrateMm: 10, kmMm: 1 });
    expect(w.text).toContain('reports kcat,');
    expect(w.text).toContain('[S]/KM = 10.');
    expect(w.caution).toBeNull();
  });

  it('when "saturating" is claimed with [S]/KM below 10, then a caution says it may not saturate', () => {
    const w = substrateWording({ substrateRegime: 'saturating', substrateMm: 5, kmMm: 1 });
    expect(w.caution).toMatch(/^\[S\]\/KM is only 5\.0:/);
  });

  it('when the substrate is well below KM, then kcat/KM is reported, with a caution above 0.1', () => {
    expect(
      substrateWording({ substrateRegime: 'sub-saturating', substrateMm: 0.05, kmMm: 1 }).caution,
    ).toBeNull();
    const close = substrateWording({ substrateRegime: 'sub-saturating', substrateMm: 0.5, kmMm: 1 });
    expect(close.text).toContain('reports kcat/KM');
    expect(close.caution).toContain('[S]/KM is 0.50');
  });

  it('when KM is not known, then no ratio is given and no caution can be raised', () => {
    const w = substrateWording({ substrateRegime: 'saturating', substrateMm: 5, kmMm: null });
    expect(w.text).not.toContain('[S]/KM =');
    expect(w.caution).toBeNull();
  });

  it('when the regime is not known, then the words say the profile may mix both', () => {
    const w = substrateWording({ substrateRegime: 'unknown', substrateMm: 1, kmMm: 1 });
    expect(w.text).toContain('may mix kcat and kcat/KM');
    expect(w.caution).toBeNull();
  });
});
