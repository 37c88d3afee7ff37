// Review over HTTP: submit → leads e-mailed with a working link → approve (locks) or return
// (author e-mailed); admins unlock with a reason; the history keeps who did what when.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { latestMail, linkIn, startTestApp, type TestApp } from './helpers/app';
import { createTeam, createUser } from './helpers/factories';
import { createStudyWorld } from './helpers/records';
import { signIn } from './helpers/session';

let t: TestApp;
let teamId: string;
let scientistUser: Awaited<ReturnType<typeof createUser>>;
let leadUser: Awaited<ReturnType<typeof createUser>>;
let scientist: Awaited<ReturnType<typeof signIn>>;
let lead: Awaited<ReturnType<typeof signIn>>;
let admin: Awaited<ReturnType<typeof signIn>>;
let viewer: Awaited<ReturnType<typeof signIn>>;

beforeAll(async () => {
  t = await startTestApp();
  teamId = (await createTeam(t.db)).id;
  scientistUser = await createUser(t.db, { role: 'scientist', teamIds: [teamId] });
  leadUser = await createUser(t.db, { role: 'lead', teamIds: [teamId] });
  const a = await createUser(t.db, { role: 'admin' });
  const v = await createUser(t.db, { role: 'viewer', teamIds: [teamId] });
  scientist = await signIn(t, scientistUser.email, scientistUser.password);
  lead = await signIn(t, leadUser.email, leadUser.password);
  admin = await signIn(t, a.email, a.password);
  viewer = await signIn(t, v.email, v.password);
});
afterAll(() => t?.close());

type Who = typeof scientist;
const post = (who: Who, path: string, body: object = {}) => who.agent.post(path).set('X-CSRF-Token', who.csrf).send(body);

describe('review', () => {
  it('when a scientist submits, then the team lead gets an e-mail whose link opens the study; approval locks every edit', async () => {
    const { study } = await createStudyWorld(t.db, teamId, scientistUser.id);
    const submitted = await post(scientist, `/api/studies/${study.id}/submit`, { message: 'Plates 1–2 done' }).expect(200);
    expect(submitted.body).toEqual({ status: 'in_review', mailSent: true });
    const mail = await latestMail(t.db);
    expect(mail.recipients).toEqual([leadUser.email]);
    expect(mail.text).toContain('Plates 1–2 done');
    const link = linkIn(mail.text);
    expect(link).toBe(`http://bellwether.test/studies/${study.id}`);

    await post(scientist, `/api/studies/${study.id}/approve`).expect(403);
    await post(lead, `/api/studies/${study.id}/approve`, { comment: 'Fits look sound.' }).expect(200);
    const toAuthor = await latestMail(t.db);
    expect(toAuthor.recipients).toEqual([scientistUser.email]);
    expect(toAuthor.subject).toBe(`Study approved: ${study.name}`);

    const patch = await scientist.agent.patch(`/api/studies/${study.id}`).set('X-CSRF-Token', scientist.csrf).send({ notes: 'x' });
    expect(patch.status).toBe(409);
    expect(patch.body.error.code).toBe('study_locked');
    await post(scientist, `/api/studies/${study.id}/plates`, { name: 'late plate', format: 96 }).expect(409);

    const history = await viewer.agent.get(`/api/studies/${study.id}/history`).expect(200);
    expect(history.body.map((e: { kind: string; author: { name: string } }) => `${e.kind}:${e.author.name}`)).toEqual([
      `submit:${scientistUser.name}`,
      `approve:${leadUser.name}`,
    ]);
  });

  it('when a lead returns a study, then a comment is required, the author is told, and editing opens again', async () => {
    const { study } = await createStudyWorld(t.db, teamId, scientistUser.id);
    await post(scientist, `/api/studies/${study.id}/submit`).expect(200);
    const noComment = await post(lead, `/api/studies/${study.id}/return`, {});
    expect(noComment.status).toBe(400);
    expect(noComment.body.error.fields.comment).toBeDefined();
    await post(lead, `/api/studies/${study.id}/return`, { comment: 'Plate 2 blanks drift; check them.' }).expect(200);
    const mail = await latestMail(t.db);
    expect(mail.recipients).toEqual([scientistUser.email]);
    expect(mail.text).toContain('Plate 2 blanks drift');
    await scientist.agent.patch(`/api/studies/${study.id}`).set('X-CSRF-Token', scientist.csrf).send({ notes: 'blanks redone' }).expect(200);
  });

  it('when a study is approved, then only an admin can unlock it, with a reason', async () => {
    const { study } = await createStudyWorld(t.db, teamId, scientistUser.id);
    await post(scientist, `/api/studies/${study.id}/submit`).expect(200);
    await post(lead, `/api/studies/${study.id}/approve`).expect(200);
    await post(lead, `/api/studies/${study.id}/unlock`, { reason: 'typo' }).expect(403);
    await post(admin, `/api/studies/${study.id}/unlock`, {}).expect(400);
    const unlocked = await post(admin, `/api/studies/${study.id}/unlock`, { reason: 'Wrong preparation lot recorded.' }).expect(200);
    expect(unlocked.body.status).toBe('returned');
  });

  it('when the step does not fit the status, then it gets 409; the submitter cannot approve their own study', async () => {
    const { study } = await createStudyWorld(t.db, teamId, leadUser.id);
    await post(lead, `/api/studies/${study.id}/approve`).expect(409);
    await post(lead, `/api/studies/${study.id}/submit`).expect(200);
    await post(lead, `/api/studies/${study.id}/submit`).expect(409);
    const own = await post(lead, `/api/studies/${study.id}/approve`);
    expect(own.status).toBe(403);
    expect(own.body.error.message).toMatch(/Someone other than the person who submitted/);
  });

  it('when a viewer comments, then it is refused; a scientist comment shows in the history', async () => {
    const { study } = await createStudyWorld(t.db, teamId, scientistUser.id);
    await post(viewer, `/api/studies/${study.id}/comments`, { body: 'hi' }).expect(403);
    await post(scientist, `/api/studies/${study.id}/comments`, { body: 'Plate 3 re-run on Friday.' }).expect(201);
    const history = await lead.agent.get(`/api/studies/${study.id}/history`).expect(200);
    expect(history.body[0]).toMatchObject({ kind: 'comment', body: 'Plate 3 re-run on Friday.' });
  });
});
