import { Router, type NextFunction, type Request, type Response } from 'express';
import multer from 'multer';
import { IMPORT_LIMITS } from '../../../../shared/impact/ords-import';
import { importForm, importListQuery } from '../../../../shared/schemas/imports';
import type { AppContext } from '../../context';
import { hasGroupRole, requireUser } from '../../auth/guards';
import { HttpError, notFound } from '../../http/errors';
import { languageOf } from '../../i18n';
import { paramId, query } from '../../http/validate';
import { getImport, listImports, previewFile, startImport, toView } from './imports';

/** One CSV file in memory (20 MB at most), and the few form fields that come with it. */
const csvUpload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: IMPORT_LIMITS.maxBytes, files: 1, fields: 5, parts: 6, fieldSize: 10_000 },
}).single('file');

function upload(req: Request, res: Response, next: NextFunction) {
  csvUpload(req, res, (err: unknown) => {
    if (!err) return next();
    // Multer's limits, and the form parser's errors on a broken body (an unexpected end, a bad boundary).
    next(
      err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE'
        ? new HttpError(413, 'file-too-large', `A file can be at most ${IMPORT_LIMITS.maxBytes / 1024 / 1024} MB.`)
        : new HttpError(400, 'bad-upload', 'Send one CSV file in the field "file".'),
    );
  });
}

const theFile = (req: Request) => {
  if (!req.file?.size) throw new HttpError(400, 'invalid', 'errors.invalid', { file: 'Choose a CSV file.' });
  return req.file;
};

const mayImport = (req: Request, scope: 'group' | 'network', groupId: number | null | undefined) => {
  const user = req.user!;
  if (scope === 'network' ? !user.admin : !groupId || !hasGroupRole(user, groupId, ['organiser']))
    throw new HttpError(
      403,
      'forbidden',
      scope === 'network'
        ? 'Only platform admins can bring in a whole network’s records.'
        : 'Only the group’s organisers can bring in its records.',
    );
};

/** Bringing in earlier records: a look at the file, the job, its progress. */
export function importRoutes(ctx: AppContext) {
  const r = Router();
  r.post('/imports/preview', requireUser, upload, (req, res) => {
    res.json(previewFile(theFile(req).buffer, languageOf(req, res.locals)));
  });

  r.post('/imports', requireUser, upload, async (req, res) => {
    const form = importForm.parse(req.body ?? {});
    mayImport(req, form.scope, form.groupId);
    const file = theFile(req);
    const id = await startImport(
      ctx,
      {
        bytes: file.buffer,
        fileName: file.originalname || 'records.csv',
        scope: form.scope,
        groupId: form.scope === 'network' ? null : form.groupId!,
        mapping: form.mapping,
        userId: req.user!.id,
      },
      languageOf(req, res.locals),
    );
    res.status(202).location(`/api/imports/${id}`).json({ id });
  });

  r.get('/imports', requireUser, async (req, res) => {
    const { groupId } = query(req, importListQuery);
    mayImport(req, groupId ? 'group' : 'network', groupId);
    res.json(await listImports(ctx, groupId ?? null, languageOf(req, res.locals)));
  });

  r.get('/imports/:id', requireUser, async (req, res) => {
    const job = await getImport(ctx, paramId(req, 'id'));
    if (!job) throw notFound('That import');
    const user = req.user!;
    const own = job.createdBy === user.id;
    if (!own && !(job.groupId ? hasGroupRole(user, job.groupId, ['organiser']) : user.admin))
      throw notFound('That import');
    res.json(toView(job, languageOf(req, res.locals)));
  });
  return r;
}
