import 'server-only';

export class InvitationError extends Error {
  constructor(public readonly reason: 'invalid' | 'expired' | 'used' | 'revoked') {
    super(`invitation ${reason}`);
  }
}

export async function acceptInvitationForSignIn(_token: string, _ip: string): Promise<{ id: string; email: string; name: string | null }> {
  throw new InvitationError('invalid');
}
