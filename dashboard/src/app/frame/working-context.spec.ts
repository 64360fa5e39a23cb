import { userWith } from '../session/test-users';
import { workingContextFor } from './working-context';

describe('workingContextFor', () => {
  const user = userWith({
    rabbitries: [{ id: 7, name: 'Brackenrow', slug: 'brackenrow', role: 'mentor' }],
    clubs: [{ id: 3, name: 'Saltmeadow Fanciers', role: 'officer' }],
  });

  it('names the rabbitry and the role held there', () => {
    expect(workingContextFor(user, { rabbitryId: '7' })).toEqual({ kind: 'rabbitry', id: 7, name: 'Brackenrow', role: 'mentor' });
  });

  it('names the club and the role held there', () => {
    expect(workingContextFor(user, { clubId: '3' })).toEqual({ kind: 'club', id: 3, name: 'Saltmeadow Fanciers', role: 'officer' });
  });

  it('falls back to everything for ids the user holds no role in, or none at all', () => {
    expect(workingContextFor(user, { rabbitryId: '8' })).toEqual({ kind: 'everything' });
    expect(workingContextFor(user, { clubId: '7' })).toEqual({ kind: 'everything' });
    expect(workingContextFor(user, {})).toEqual({ kind: 'everything' });
  });
});
