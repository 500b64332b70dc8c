import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { createHash } from 'node:crypto';
import { basename } from 'node:path';
import type { Readable } from 'node:stream';
import { EntityManager, Repository } from 'typeorm';
import type { Actor } from '../common/ownership';
import { DrawingAnalysisService } from './drawing-analysis.service';
import type { ChoosableUnits } from './dto/revision.dto';
import { Attachment } from './entities/attachment.entity';
import { Drawing } from './entities/drawing.entity';
import { attachmentKindOf, checkDrawingBytes } from './file-kinds';
import { PlanFilesService } from './plan-files.service';
import {
  AttachmentNotFoundError,
  DrawingNotFoundError,
  DuplicateUploadError,
  FileTooLargeError,
  isDuplicateKey,
  RevisionStateError,
  UploadRefusedError,
} from './plans.errors';
import type { Viewer } from './plans.service';
import { RevisionsService } from './revisions.service';

/** Larger drawings than the demo plans' by three orders of magnitude, well inside the core's own limits. */
export const DRAWING_MAX_BYTES = 16 * 1024 * 1024;
export const ATTACHMENT_MAX_BYTES = 8 * 1024 * 1024;

/** A file as the multipart parser hands it over, held in memory. */
export interface ReceivedFile {
  originalname: string;
  size: number;
  buffer: Buffer;
}

export interface UploadedDrawing {
  drawing: Drawing;
  /** Settles when the analysis has finished (done or failed); it never rejects. */
  analysed: Promise<void>;
}

export interface AttachmentDownload {
  attachment: Attachment;
  body: Readable;
}

/** A file name fit to keep and send back: no folders, no control characters. */
function cleanName(name: string): string {
  const cleaned = basename(name.replace(/\\/g, '/'))
    .replace(/[\p{Cc}"]/gu, '')
    .trim()
    .slice(0, 255);
  return cleaned || 'file';
}

/** What differs between storing a drawing and storing an attachment. */
interface FileKind {
  what: 'drawing' | 'attachment';
  folder: 'drawings' | 'attachments';
  /** The name under which the same bytes are already on the revision; null when they are not. */
  existingName: (manager: EntityManager, revisionId: number, sha256: string) => Promise<string | null>;
}

const DRAWING_FILES: FileKind = {
  what: 'drawing',
  folder: 'drawings',
  existingName: async (manager, revisionId, sha256) =>
    (await manager.findOneBy(Drawing, { revisionId, sha256 }))?.originalName ?? null,
};

const ATTACHMENT_FILES: FileKind = {
  what: 'attachment',
  folder: 'attachments',
  existingName: async (manager, revisionId, sha256) =>
    (await manager.findOneBy(Attachment, { revisionId, sha256 }))?.name ?? null,
};

/**
 * Drawings and attachments of revisions. Uploads pass through the server (not presigned) so that
 * the bytes are checked before anything is stored, and nothing is half-done: the object goes to the
 * store first, the row second, and the object is removed again if the row cannot be written.
 */
@Injectable()
export class UploadsService {
  constructor(
    @InjectRepository(Drawing) private readonly drawings: Repository<Drawing>,
    @InjectRepository(Attachment) private readonly attachments: Repository<Attachment>,
    private readonly revisions: RevisionsService,
    private readonly files: PlanFilesService,
    private readonly analysis: DrawingAnalysisService,
  ) {}

  sha256Of(bytes: Buffer): string {
    return createHash('sha256').update(bytes).digest('hex');
  }

  async uploadDrawing(
    actor: Actor,
    slug: string,
    number: number,
    file: ReceivedFile,
    units?: ChoosableUnits,
  ): Promise<UploadedDrawing> {
    if (file.size > DRAWING_MAX_BYTES) throw new FileTooLargeError('drawing', DRAWING_MAX_BYTES);
    const check = checkDrawingBytes(file.buffer);
    if (!check.ok) throw new UploadRefusedError(check.code, check.message);
    const sha256 = this.sha256Of(file.buffer);
    const { drawing, claim } = await this.store(
      actor,
      slug,
      number,
      DRAWING_FILES,
      file.buffer,
      'application/dxf',
      sha256,
      async (manager, revisionId, storageKey) => {
        const saved = await manager.save(
          manager.create(Drawing, {
            revisionId,
            storageKey,
            originalName: cleanName(file.originalname),
            size: file.size,
            sha256,
            units: units ?? null,
            status: 'queued',
            error: null,
            analysis: null,
            entityCount: null,
          }),
        );
        return { drawing: saved, claim: await this.analysis.claim(manager, saved.id) };
      },
    );
    return { drawing, analysed: this.analysis.analyse(drawing.id, claim, file.buffer.toString('utf8')) };
  }

  async uploadAttachment(
    actor: Actor,
    slug: string,
    number: number,
    file: ReceivedFile,
    description = '',
  ): Promise<Attachment> {
    if (file.size > ATTACHMENT_MAX_BYTES) throw new FileTooLargeError('attachment', ATTACHMENT_MAX_BYTES);
    const name = cleanName(file.originalname);
    const kind = attachmentKindOf(file.buffer, name);
    if (!kind.ok) throw new UploadRefusedError('attachment_kind_refused', kind.message);
    const sha256 = this.sha256Of(file.buffer);
    return this.store(
      actor,
      slug,
      number,
      ATTACHMENT_FILES,
      file.buffer,
      kind.mediaType,
      sha256,
      (manager, revisionId, storageKey) =>
        manager.save(
          manager.create(Attachment, {
            revisionId,
            storageKey,
            name,
            mediaType: kind.mediaType,
            size: file.size,
            sha256,
            description,
          }),
        ),
    );
  }

  /** For a drawing that declares no units: reads it again in the ones chosen. */
  async setUnits(
    actor: Actor,
    slug: string,
    number: number,
    drawingId: number,
    units: ChoosableUnits,
  ): Promise<UploadedDrawing> {
    const { drawing, claim, text } = await this.drawings.manager.transaction(async (manager) => {
      const { revision } = await this.revisions.getEditable(actor, slug, number, manager);
      const found = await manager.findOneBy(Drawing, { id: drawingId, revisionId: revision.id });
      if (!found) throw new DrawingNotFoundError(drawingId);
      if (found.status !== 'done' || found.analysis?.units !== 'unknown') {
        throw new RevisionStateError(
          'drawing_has_units',
          found.status === 'done'
            ? `${found.originalName} declares its units (${found.analysis?.units ?? 'unknown'}); they cannot be changed.`
            : `${found.originalName} is not analysed yet; its units can be chosen once it is.`,
        );
      }
      // Read before the change, so that a store that does not answer leaves the drawing as it was.
      const bytes = await this.files.read(found.storageKey);
      found.units = units;
      found.status = 'queued';
      const saved = await manager.save(found);
      return { drawing: saved, claim: await this.analysis.claim(manager, saved.id), text: bytes.toString('utf8') };
    });
    return { drawing, analysed: this.analysis.analyse(drawing.id, claim, text) };
  }

  async deleteDrawing(actor: Actor, slug: string, number: number, drawingId: number): Promise<void> {
    await this.drawings.manager.transaction(async (manager) => {
      const { revision } = await this.revisions.getEditable(actor, slug, number, manager);
      const drawing = await manager.findOneBy(Drawing, { id: drawingId, revisionId: revision.id });
      if (!drawing) throw new DrawingNotFoundError(drawingId);
      await manager.delete(Drawing, { id: drawing.id });
      // Inside the transaction: if the store refuses, the row stays and still has its file.
      await this.files.delete(drawing.storageKey);
    });
  }

  async deleteAttachment(actor: Actor, slug: string, number: number, attachmentId: number): Promise<void> {
    await this.attachments.manager.transaction(async (manager) => {
      const { revision } = await this.revisions.getEditable(actor, slug, number, manager);
      const attachment = await manager.findOneBy(Attachment, { id: attachmentId, revisionId: revision.id });
      if (!attachment) throw new AttachmentNotFoundError(attachmentId);
      await manager.delete(Attachment, { id: attachment.id });
      await this.files.delete(attachment.storageKey);
    });
  }

  async download(viewer: Viewer, slug: string, number: number, attachmentId: number): Promise<AttachmentDownload> {
    const { revision } = await this.revisions.getReadable(viewer, slug, number);
    const attachment = await this.attachments.findOneBy({ id: attachmentId, revisionId: revision.id });
    if (!attachment) throw new AttachmentNotFoundError(attachmentId);
    return { attachment, body: await this.files.stream(attachment.storageKey) };
  }

  private async store<T>(
    actor: Actor,
    slug: string,
    number: number,
    kind: FileKind,
    bytes: Buffer,
    contentType: string,
    sha256: string,
    insert: (manager: EntityManager, revisionId: number, storageKey: string) => Promise<T>,
  ): Promise<T> {
    let storedKey: string | null = null;
    try {
      return await this.drawings.manager.transaction(async (manager) => {
        const { plan, revision } = await this.revisions.getEditable(actor, slug, number, manager);
        const existing = await kind.existingName(manager, revision.id, sha256);
        if (existing !== null) throw new DuplicateUploadError(kind.what, existing);
        const storageKey = this.files.newKey(plan.id, revision.id, kind.folder);
        await this.files.put(storageKey, bytes, contentType);
        storedKey = storageKey;
        return insert(manager, revision.id, storageKey);
      });
    } catch (error) {
      if (storedKey) await this.files.discard([storedKey]);
      if (isDuplicateKey(error)) throw new DuplicateUploadError(kind.what, 'another upload');
      throw error;
    }
  }
}
