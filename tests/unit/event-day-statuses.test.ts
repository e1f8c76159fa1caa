import { describe, expect, it } from 'vitest';
import {
  canMoveTo,
  hasArrived,
  isAbsent,
  isClosed,
  isOpen,
  isQueued,
  ITEM_STATUSES,
  ITEM_TRANSITIONS,
  mayRecordOutcome,
  mayStartRepair,
  type ItemStatus,
} from '../../shared/event-day/constants';

const where = (p: (s: ItemStatus) => boolean) => ITEM_STATUSES.filter(p);

describe('status predicates read the one transition table', () => {
  it('answers canMoveTo exactly as the table lists each change, for every pair of statuses', () => {
    for (const from of ITEM_STATUSES)
      for (const to of ITEM_STATUSES) expect(canMoveTo(from, to)).toBe(ITEM_TRANSITIONS[from].includes(to));
  });

  it('sorts every status into open or closed, never both', () => {
    expect(where(isOpen)).toEqual(['booked', 'checked-in', 'waiting', 'at-bench']);
    expect(where(isClosed)).toEqual(['done', 'no-show', 'withdrawn']);
    for (const s of ITEM_STATUSES) expect(isOpen(s)).toBe(!isClosed(s));
  });

  it('counts as arrived exactly the statuses from which an outcome may be recorded', () => {
    expect(where(hasArrived)).toEqual(['checked-in', 'waiting', 'at-bench', 'done']);
    for (const s of ITEM_STATUSES) expect(mayRecordOutcome(s)).toBe(hasArrived(s));
  });

  it('queues checked-in and waiting items, and a fixer may start exactly on those', () => {
    expect(where(isQueued)).toEqual(['checked-in', 'waiting']);
    expect(where(mayStartRepair)).toEqual(where(isQueued));
  });

  it('treats no-shows and withdrawals as absent: only a new check-in brings them back', () => {
    expect(where(isAbsent)).toEqual(['no-show', 'withdrawn']);
    for (const s of where(isAbsent)) {
      expect(hasArrived(s)).toBe(false);
      expect(canMoveTo(s, 'checked-in')).toBe(true);
      expect(ITEM_TRANSITIONS[s].filter((to) => to !== 'withdrawn')).toEqual(['checked-in']);
    }
  });

  it('leaves done only by recording the outcome again', () => {
    expect(ITEM_TRANSITIONS.done).toEqual(['done']);
    for (const to of ITEM_STATUSES) expect(canMoveTo('done', to)).toBe(to === 'done');
  });
});
