import { describe, expect, it } from 'vitest';
import { requestIdFor } from '@/server/request-id';

// RFC 9562 section 5.4: a version-4 UUID has "4" as its version nibble and 8, 9, a or b as its variant nibble.
const UUID_V4 = /^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/;

describe('request id', () => {
  it('is a fresh UUID, ignoring a client-sent one when no proxy is trusted', () => {
    const id = requestIdFor('attacker-chosen', 0);
    expect(id).toMatch(UUID_V4);
    expect(requestIdFor(undefined, 0)).not.toBe(id);
  });

  it("keeps a trusted proxy's id only when it is a short safe token", () => {
    expect(requestIdFor('lb-7f3a.91', 1)).toBe('lb-7f3a.91');
    expect(requestIdFor('x'.repeat(65), 1)).toMatch(UUID_V4);
    expect(requestIdFor('a b', 1)).toMatch(UUID_V4);
    expect(requestIdFor('id"<script>', 1)).toMatch(UUID_V4);
    expect(requestIdFor(['one', 'two'], 1)).toMatch(UUID_V4);
  });
});
