// Species cards and their photos against the real MariaDB.
import { afterAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import sharp from 'sharp';
import { createHash } from 'node:crypto';
import { signUp, testApp } from '../../support/test-app';

const t = testApp();
afterAll(() => t.close());

const DOCK = '5eedfa00-0000-4000-8000-000000000101';

// Trade fact (common practice, no published source): two docks of one genus are told apart
// mainly by leaf width and a wavy leaf margin — a look-alikes table holds such rows.
const dockCard = {
  identificationNotes: 'Broad basal leaves; reddish flowering stem by midsummer.',
  lookAlikes: [
    {
      feature: 'Leaf width',
      thisSpecies: 'Broad, a third as wide as long',
      lookAlike: 'Narrow, strap-like',
      lookAlikeName: 'Ribbon dock',
    },
    { feature: 'Leaf margin', thisSpecies: 'Flat', lookAlike: 'Strongly wavy', lookAlikeName: 'Ribbon dock' },
  ],
  lifeForm: 'Perennial with a taproot',
  status: 'Introduced (as entered)',
};

async function editorWithCard() {
  const u = await signUp(t.app, 'cards');
  const res = await u.agent.put(`/api/workspaces/${u.workspaceId}/profiles/${DOCK}/card`).send(dockCard);
  if (res.status !== 200) throw new Error(`card: ${res.status} ${JSON.stringify(res.body)}`);
  return u;
}

const photoPath = (ws: string) => `/api/workspaces/${ws}/profiles/${DOCK}/card/photos`;

describe('species cards', () => {
  it('keep a look-alikes table feature by feature, per workspace', async () => {
    const { agent, workspaceId } = await editorWithCard();
    const card = (await agent.get(`/api/workspaces/${workspaceId}/profiles/${DOCK}/card`)).body;
    expect(card.lookAlikes.map((r: { feature: string }) => r.feature)).toEqual(['Leaf width', 'Leaf margin']);
    expect(card.lookAlikes[1]).toMatchObject({
      thisSpecies: 'Flat',
      lookAlike: 'Strongly wavy',
      lookAlikeName: 'Ribbon dock',
    });
    expect(card).toMatchObject({
      lifeForm: 'Perennial with a taproot',
      status: 'Introduced (as entered)',
      photos: [],
    });
    // The same built-in profile has no card in another workspace.
    const other = await signUp(t.app, 'cards-other');
    expect((await other.agent.get(`/api/workspaces/${other.workspaceId}/profiles/${DOCK}/card`)).status).toBe(
      404,
    );
    expect((await other.agent.get(`/api/workspaces/${workspaceId}/profiles/${DOCK}/card`)).status).toBe(404);
  });

  it('refuse a look-alike row without its look-alike, naming the cell; viewers cannot write', async () => {
    const { agent, workspaceId, email: _e } = await editorWithCard();
    const bad = {
      ...dockCard,
      lookAlikes: [
        { feature: 'Leaf width', thisSpecies: 'Broad', lookAlike: '', lookAlikeName: 'Ribbon dock' },
      ],
    };
    const res = await agent.put(`/api/workspaces/${workspaceId}/profiles/${DOCK}/card`).send(bad);
    expect(res.status).toBe(400);
    expect(res.body.error.fields['lookAlikes[0].lookAlike']).toBeDefined();
    const viewer = await signUp(t.app, 'card-viewer');
    await agent.post(`/api/workspaces/${workspaceId}/members`).send({ email: viewer.email, role: 'viewer' });
    expect((await viewer.agent.get(`/api/workspaces/${workspaceId}/profiles/${DOCK}/card`)).status).toBe(200);
    expect(
      (await viewer.agent.put(`/api/workspaces/${workspaceId}/profiles/${DOCK}/card`).send(dockCard)).status,
    ).toBe(403);
    expect((await agent.delete(`/api/workspaces/${workspaceId}/profiles/${DOCK}/card`)).status).toBe(204);
    expect((await agent.get(`/api/workspaces/${workspaceId}/profiles/${DOCK}/card`)).status).toBe(404);
  });
});

describe('card photos', () => {
  it('refuse a file that is not an image even when it is named .jpg', async () => {
    const { agent, workspaceId } = await editorWithCard();
    const res = await agent
      .post(photoPath(workspaceId))
      .field('caption', 'Rosette in April')
      .attach('photo', Buffer.from('this is a plain text note, not a photo\n'), {
        filename: 'rosette.jpg',
        contentType: 'image/jpeg',
      });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/not a JPEG or PNG/);
    expect(res.body.error.fields.photo).toBeDefined();
  });

  it('refuse a file over 5 MB with 413 and a clear message', async () => {
    const { agent, workspaceId } = await editorWithCard();
    const big = Buffer.alloc(5 * 1024 * 1024 + 1, 0);
    big.set([0xff, 0xd8, 0xff], 0);
    const res = await agent
      .post(photoPath(workspaceId))
      .field('caption', 'Huge')
      .attach('photo', big, 'huge.jpg');
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('too_large');
    expect(res.body.error.message).toContain('5 MB');
  });

  it('store a photo resized and without its location metadata, served with its type', async () => {
    const { agent, workspaceId } = await editorWithCard();
    // A JPEG carrying EXIF with GPS coordinates (sharp's withExif writes the GPS IFD).
    const original = await sharp({
      create: { width: 2400, height: 1800, channels: 3, background: '#6f5744' },
    })
      .jpeg()
      .withExif({
        IFD0: { Make: 'FieldCam', Model: 'Seedwake test' },
        IFD3: {
          GPSLatitudeRef: 'N',
          GPSLatitude: '45/1 30/1 0/1',
          GPSLongitudeRef: 'W',
          GPSLongitude: '122/1 40/1 0/1',
        },
      })
      .toBuffer();
    const before = await sharp(original).metadata();
    expect(before.exif).toBeDefined();
    expect(before.exif!.toString('latin1')).toContain('FieldCam');

    const res = await agent
      .post(photoPath(workspaceId))
      .field('caption', 'Rosette at Hollow Lane')
      .attach('photo', original, 'rosette.jpg');
    expect(res.status).toBe(201);
    const [photo] = res.body.photos;
    expect(photo).toMatchObject({
      caption: 'Rosette at Hollow Lane',
      contentType: 'image/jpeg',
      width: 1600,
      height: 1200,
    });

    const served = await agent
      .get(`${photoPath(workspaceId)}/${photo.id}`)
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(served.status).toBe(200);
    expect(served.headers['content-type']).toBe('image/jpeg');
    const bytes = served.body as Buffer;
    expect(createHash('sha256').update(bytes).digest('hex')).toBe(photo.sha256);
    const after = await sharp(bytes).metadata();
    expect(after.format).toBe('jpeg');
    expect(Math.max(after.width!, after.height!)).toBeLessThanOrEqual(1600);
    expect(after.exif).toBeUndefined();
    expect(bytes.toString('latin1')).not.toContain('FieldCam');
    // Signed out there is no way to it through the workspace API.
    expect((await request(t.app).get(`${photoPath(workspaceId)}/${photo.id}`)).status).toBe(401);
    expect((await agent.delete(`${photoPath(workspaceId)}/${photo.id}`)).status).toBe(204);
    expect((await agent.get(`${photoPath(workspaceId)}/${photo.id}`)).status).toBe(404);
  });

  it('accept a PNG and show it through the class link of a lesson on the profile, and no other photo', async () => {
    const { agent, workspaceId } = await editorWithCard();
    const png = await sharp({ create: { width: 300, height: 200, channels: 4, background: '#347340' } })
      .png()
      .toBuffer();
    const card = (
      await agent
        .post(photoPath(workspaceId))
        .field('caption', 'Seed heads')
        .attach('photo', png, 'seeds.png')
    ).body;
    const photoId = card.photos[0].id;
    const lesson = await agent.post(`/api/workspaces/${workspaceId}/lessons`).send({
      title: 'Decay',
      profileId: DOCK,
      definition: {
        template: 'seedbank-decay',
        settings: {
          horizonYears: 40,
          initialSeedbank: 100,
          scale: 'log',
          replicates: 20,
          seed: 1,
          sliders: Object.fromEntries(
            ['decay', 'germination', 'compareDecay', 'compareGermination'].map((k) => [
              k,
              { min: 0, max: 1, step: 0.01, value: 0.1 },
            ]),
          ),
        },
      },
    });
    const token = (await agent.post(`/api/workspaces/${workspaceId}/lessons/${lesson.body.id}/link`)).body
      .token;
    const view = (await request(t.app).get(`/api/class/${token}`)).body;
    expect(view.card.photos.map((p: { id: string }) => p.id)).toEqual([photoId]);
    const img = await request(t.app).get(`/api/class/${token}/photos/${photoId}`);
    expect(img.status).toBe(200);
    expect(img.headers['content-type']).toBe('image/png');
    // A photo of another workspace's card is not reachable through this link.
    const other = await editorWithCard();
    const otherPhoto = (
      await other.agent.post(photoPath(other.workspaceId)).field('caption', 'x').attach('photo', png, 'x.png')
    ).body.photos[0].id;
    expect((await request(t.app).get(`/api/class/${token}/photos/${otherPhoto}`)).status).toBe(404);
  });
});
