import { userWith } from '../session/test-users';
import { clubRoleOf, editsRecords, rabbitryRoleOf } from './records-access';

describe('records access', () => {
  const user = userWith({
    rabbitries: [{ id: 4, name: 'Brackenrow', slug: 'brackenrow', role: 'mentor' }],
    clubs: [{ id: 9, name: 'Saltmeadow Fanciers', role: 'officer' }],
  });

  it('finds the role by the id in the address', () => {
    expect(rabbitryRoleOf(user, '4')).toBe('mentor');
    expect(rabbitryRoleOf(user, '5')).toBeNull();
    expect(rabbitryRoleOf(null, '4')).toBeNull();
    expect(clubRoleOf(user, '9')).toBe('officer');
    expect(clubRoleOf(user, '4')).toBeNull();
  });

  it('lets owners and partners edit, as the design’s role table says, and not mentors', () => {
    expect(editsRecords('owner')).toBe(true);
    expect(editsRecords('partner')).toBe(true);
    expect(editsRecords('mentor')).toBe(false);
    expect(editsRecords(null)).toBe(false);
  });
});
