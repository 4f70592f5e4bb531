// What a service needs to write an e-mail: the address people open Heatpath at (for links), and
// a seal for sign-in links. An invitation or reset link carries a token whose hash alone is
// stored, so the outbox keeps the link encrypted (AES-256-GCM, a key derived from the session
// secret) and the worker opens it only to send; it is erased once sent.
import { createCipheriv, createDecipheriv, hkdfSync, randomBytes } from 'node:crypto';

/** Where a message body says the sealed link goes. */
export const linkPlaceholder = '{{link}}';

export interface MailContext {
  publicUrl: string;
  sealLink(link: string): string;
  unsealLink(sealed: string): string;
}

export function createMailContext(options: { publicUrl: string; secret: string }): MailContext {
  const key = Buffer.from(
    hkdfSync('sha256', options.secret, 'heatpath-outbox', 'sealed sign-in links', 32),
  );
  return {
    publicUrl: options.publicUrl,
    sealLink(link) {
      const iv = randomBytes(12);
      const cipher = createCipheriv('aes-256-gcm', key, iv);
      const body = Buffer.concat([cipher.update(link, 'utf8'), cipher.final()]);
      return ['v1', iv, cipher.getAuthTag(), body]
        .map((p) => (typeof p === 'string' ? p : p.toString('base64url')))
        .join('.');
    },
    unsealLink(sealed) {
      const [version, iv, tag, body] = sealed.split('.');
      if (version !== 'v1' || !iv || !tag || !body) throw new Error('not a sealed link');
      const decipher = createDecipheriv('aes-256-gcm', key, Buffer.from(iv, 'base64url'));
      decipher.setAuthTag(Buffer.from(tag, 'base64url'));
      return Buffer.concat([
        decipher.update(Buffer.from(body, 'base64url')),
        decipher.final(),
      ]).toString('utf8');
    },
  };
}
