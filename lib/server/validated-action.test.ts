import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { validatedAction } from './validated-action';

const schema = z.object({ email: z.email('Enter an e-mail address.'), role: z.enum(['admin', 'planner'], { error: 'Choose a role.' }) });

describe('validatedAction', () => {
  it('returns every field error without calling the action', async () => {
    let called = false;
    const action = validatedAction(schema, async () => {
      called = true;
      return { ok: true };
    });
    const r = await action({ email: 'x', role: 'chief' } as never);
    expect(called).toBe(false);
    expect(r).toEqual({ ok: false, message: 'Some fields need attention.', fieldErrors: { email: ['Enter an e-mail address.'], role: ['Choose a role.'] } });
  });
  it('accepts FormData as a plain form post sends it, dropping the framework fields', async () => {
    const action = validatedAction(schema, async (data) => ({ ok: true, data }));
    const fd = new FormData();
    fd.set('email', 'a@b.org');
    fd.set('role', 'planner');
    fd.set('$ACTION_ID_abc', '');
    expect(await action(fd)).toEqual({ ok: true, data: { email: 'a@b.org', role: 'planner' } });
  });
});
