import { InvitationStatus, MemberStatus } from '@gelpoint/contracts';
import { describe, expect, it } from 'vitest';
import { invitationStatusWords, memberStatusWords } from './status-words';

describe('status words', () => {
  it('covers every member and invitation status the API sends, each with its own label', () => {
    expect(Object.keys(memberStatusWords).sort()).toEqual([...MemberStatus.options].sort());
    expect(Object.keys(invitationStatusWords).sort()).toEqual([...InvitationStatus.options].sort());
    const labels = Object.values(invitationStatusWords).map((words) => words.label);
    expect(new Set(labels).size).toBe(labels.length);
  });

  it('never gives two invitation statuses the same shape, so colour is not the only difference', () => {
    const shapes = Object.values(invitationStatusWords).map((words) => words.shape);
    expect(new Set(shapes).size).toBe(shapes.length);
  });
});
