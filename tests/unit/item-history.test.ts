import { describe, expect, it } from 'vitest';
import { historyEntries, type HistoryRow } from '@/lib/register/history';

// Invented edits to an invented item. 1 lb = 0.45359237 kg and 1 ft = 0.3048 m exactly (NIST SP 811, appendix B):
// 3 kg = 6.614 lb, 30 kg = 66.14 lb, 25 m = 82.02 ft, 0.3 m = 0.9843 ft.
const at = new Date('2026-11-30T09:15:00Z');
const levels = new Map([['L1', 'Cellar deck']]);
const edit: HistoryRow = {
  id: 7,
  action: 'item.updated',
  entity_type: 'item',
  created_at: at,
  actor_name: 'Ines Okafor',
  before: { tag: 'H-1', mass_kg: 3, height_m: null, level_id: 'L1', securing: 'unsecured', dimensions_m: { length: 0.3 } },
  after: { tag: 'H-1', mass_kg: 30, height_m: 25, level_id: 'L1', securing: 'tethered', dimensions_m: { length: 0.3 } },
};

describe('an item history a reader can follow', () => {
  it('names the fields and shows the values in the reader’s units, only where they changed', () => {
    const [entry] = historyEntries([edit], 'us', levels);
    expect(entry.what).toBe('Changed');
    expect(entry.by).toBe('Ines Okafor');
    expect(entry.changes).toEqual([
      { label: 'Mass', from: '6.614 lb', to: '66.14 lb' },
      { label: 'Release height', from: "the level's floor height", to: '82.02 ft' },
      { label: 'Securing', from: expect.stringMatching(/./), to: expect.stringMatching(/ether/i) },
    ]);
  });

  it('in SI, the same change reads in kilograms and metres', () => {
    const [entry] = historyEntries([edit], 'si', levels);
    expect(entry.changes.slice(0, 2)).toEqual([
      { label: 'Mass', from: '3 kg', to: '30 kg' },
      { label: 'Release height', from: "the level's floor height", to: '25 m' },
    ]);
  });

  it('a level change that recomputed the item says so, naming the level', () => {
    const row: HistoryRow = { ...edit, id: 9, action: 'level.updated', entity_type: 'level', before: { name: 'Cellar deck' }, after: { name: 'Cellar deck', recomputed_items: 4 } };
    const [entry] = historyEntries([row], 'si', levels);
    expect(entry.what).toBe('Result recomputed: its level “Cellar deck” changed (floor height, surface or water depth)');
    expect(entry.changes).toEqual([]);
  });
});
