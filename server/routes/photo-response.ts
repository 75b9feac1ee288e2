import type { Response } from 'express';

/** A stored card photo as an image response: its own type, inline, briefly cacheable by the browser only. */
export function sendPhoto(res: Response, photo: { contentType: string; data: Buffer; sha256: string }) {
  res
    .type(photo.contentType)
    .set({
      'Cache-Control': 'private, max-age=300',
      ETag: `"${photo.sha256}"`,
      'Content-Disposition': 'inline',
    })
    .send(photo.data);
}
