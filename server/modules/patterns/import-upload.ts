/**
 * Reading an uploaded pattern file with the engine's importers. Pure of the server's state: the
 * import worker (import-job.ts) runs it, off the main thread.
 */
import path from 'node:path';
import { DxfImportError, type Pattern, PatternError, SvgImportError, XmlError, importDxf, importSvg, parsePattern } from '../../../geometry/index.ts';
import { AppError } from '../../errors/app-error.ts';
import type { PatternSource } from './pattern.entity.ts';

export interface UploadedFile {
  originalname: string;
  buffer: Buffer;
}

export interface ImportedUpload {
  pattern: Pattern;
  format: PatternSource;
  notes: string[];
}

/** Read an uploaded file with the engine's importers. Nothing of the file but the geometry is kept. */
export function importUpload(file: UploadedFile): ImportedUpload {
  const ext = path.extname(file.originalname).toLowerCase();
  const head = file.buffer.subarray(0, 512).toString('latin1').trimStart();
  const format: PatternSource | undefined =
    ext === '.svg' || head.startsWith('<') ? 'svg' : ext === '.dxf' || /^0\s*\r?\n\s*SECTION/.test(head) ? 'dxf' : ext === '.json' || head.startsWith('{') ? 'json' : undefined;
  if (!format) throw new AppError('unprocessable', 'Blockwright reads SVG, DXF (ASTM D6673) and its own JSON pattern files; this file is none of them.', 422, { file: 'Use an .svg, .dxf or .json file.' });
  try {
    if (format === 'svg') {
      const text = new TextDecoder('utf-8', { fatal: true }).decode(file.buffer);
      const r = importSvg(text);
      return { pattern: r.pattern, format, notes: [...r.notes, ...(r.skipped.length > 0 ? [`not imported: ${r.skipped.join(', ')}`] : [])] };
    }
    if (format === 'dxf') {
      // DXF before AutoCAD 2007 is in the drawing's code page; latin1 reads every byte.
      const r = importDxf(file.buffer.toString('latin1'));
      return { pattern: r.pattern, format, notes: [...r.notes] };
    }
    let json: unknown;
    try {
      json = JSON.parse(file.buffer.toString('utf8'));
    } catch {
      throw new AppError('unprocessable', 'The JSON file cannot be read: it is not valid JSON.', 422, { file: 'not valid JSON' });
    }
    return { pattern: parsePattern(json), format, notes: [] };
  } catch (e) {
    if (e instanceof SvgImportError || e instanceof XmlError || e instanceof DxfImportError || e instanceof PatternError)
      throw new AppError('unprocessable', `The ${format.toUpperCase()} file cannot be imported: ${e.message}`, 422, { file: e.message });
    if (e instanceof TypeError && /decode/i.test(e.message))
      throw new AppError('unprocessable', 'The SVG file is not UTF-8 text.', 422, { file: 'not UTF-8 text' });
    throw e;
  }
}
