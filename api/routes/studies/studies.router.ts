import { Router, type Request } from 'express';
import { createStudySchema, saveDocumentSchema } from '../../../shared/schemas/studies';
import type { AppContext } from '../../context';
import { currentUser } from '../../middleware/auth';
import { idParam, parse } from '../../middleware/parse';
import { createStudy } from './create-study';
import { saveStudyDocument } from './save-document';
import { listStudies } from './studies.service';
import { readStudyJson } from './study-read';
import { assertStudyRole, loadEngagementForStudies, loadStudyFor, type Access } from './study-access';
import { loadStudyTemplates, summariseTemplate } from './template-registry';

/** Studies of an engagement, one study, saving its document, and the templates to start from. */
export function studiesRouter(ctx: AppContext): Router {
  const r = Router();
  const engagement = (req: Request, access: Access) => loadEngagementForStudies(ctx.db, currentUser(req), idParam(req.params.id, 'That engagement'), access);
  const study = (req: Request, access: Access) => loadStudyFor(ctx.db, currentUser(req), idParam(req.params.id, 'That study'), access);

  r.get('/engagements/:id/studies', async (req, res) => {
    res.json({ studies: await listStudies(ctx, (await engagement(req, 'read')).id) });
  });
  r.post('/engagements/:id/studies', async (req, res) => {
    const e = await engagement(req, 'write');
    res.status(201).json({ study: await createStudy(ctx, e, parse(createStudySchema, req.body), currentUser(req), req.ip) });
  });
  r.get('/studies/:id', async (req, res) => {
    res.type('json').send(await readStudyJson(ctx, currentUser(req), idParam(req.params.id, 'That study')));
  });
  r.put('/studies/:id/document', async (req, res) => {
    const { study: s, engagement: e } = await study(req, 'write');
    res.json({ study: await saveStudyDocument(ctx, s, e, parse(saveDocumentSchema, req.body), currentUser(req)) });
  });
  r.get('/templates', async (req, res) => {
    assertStudyRole(currentUser(req), 'read');
    res.json({ templates: (await loadStudyTemplates()).map(summariseTemplate) });
  });
  return r;
}
