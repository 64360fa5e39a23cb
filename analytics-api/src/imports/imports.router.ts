import type { Request, RequestHandler, Response } from 'express';
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import multer from 'multer';
import * as z from 'zod';
import { CommitOptions, ImportCheckOptions, ImportKind } from '@shared/contracts/imports';
import { ANY_RABBITRY_ROLE, club, RABBITRY_EDITORS, type AccessRule } from '../access/access-rules';
import type { RouteRegistrar } from '../access/route-registrar';
import { AppError } from '../http/app-error';
import { idParam, validate } from '../http/validate';
import type { ImportsService, Scope } from './imports.service';

const scopeOf = (res: Response): Scope => {
  const a = res.locals.access;
  return a.rabbitryId ? { type: 'rabbitry', id: a.rabbitryId } : { type: 'club', id: a.clubId! };
};

/** Import routes, the same for a rabbitry's herd files and a club's result files. */
export function registerImportRoutes(r: RouteRegistrar, service: ImportsService, opts: { dataDir: string; uploadLimitMb: number }): void {
  const incoming = join(opts.dataDir, 'imports', 'incoming');
  mkdirSync(incoming, { recursive: true });
  const upload = multer({ dest: incoming, limits: { fileSize: opts.uploadLimitMb * 1024 * 1024, files: 1 } }).single('file');
  const receive: RequestHandler = (req, res, next) => upload(req, res, (err: unknown) => {
    if (err instanceof multer.MulterError) {
      return next(err.code === 'LIMIT_FILE_SIZE'
        ? new AppError('too-large', `The file is larger than the ${opts.uploadLimitMb} MB limit: split it into smaller files`, 413)
        : new AppError('bad-upload', `The upload was not understood (${err.message})`, 400));
    }
    next(err);
  });

  const scopes: { base: string; read: AccessRule; write: AccessRule }[] = [
    { base: '/rabbitries/:rabbitryId/imports', read: ANY_RABBITRY_ROLE, write: RABBITRY_EDITORS },
    { base: '/clubs/:clubId/imports', read: club('officer'), write: club('officer') },
  ];
  const job = (req: Request) => idParam(req.params.jobId, 'Import');

  for (const { base, read, write } of scopes) {
    r.add('get', base, read, async (_req, res) => {
      res.json({ imports: await service.history(scopeOf(res)) });
    });
    r.add('post', base, write, receive, async (req, res) => {
      if (!req.file) throw new AppError('validation', 'Choose a file to upload', 400, { file: 'Choose a file to upload' });
      const { kind } = validate(z.object({ kind: ImportKind }), req.body);
      res.status(201).json(await service.upload(scopeOf(res), req.user!.id, kind, req.file));
    });
    r.add('get', `${base}/:jobId`, read, async (req, res) => {
      res.json(await service.get(scopeOf(res), job(req)));
    });
    r.add('post', `${base}/:jobId/check`, write, async (req, res) => {
      const options = validate(ImportCheckOptions, req.body);
      res.status(202).json(await service.startCheck(scopeOf(res), job(req), req.user!.id, req.user!.weightUnit, options));
    });
    r.add('post', `${base}/:jobId/commit`, write, async (req, res) => {
      const { skipRowsWithErrors } = validate(CommitOptions, req.body ?? {});
      res.status(202).json(await service.startCommit(scopeOf(res), job(req), req.user!.id, req.user!.weightUnit, skipRowsWithErrors));
    });
    r.add('get', `${base}/:jobId/problems.csv`, read, async (req, res) => {
      const { fileName, csv } = await service.errorReport(scopeOf(res), job(req));
      res.attachment(fileName).type('text/csv').send(csv);
    });
  }
}
