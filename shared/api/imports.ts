import type { RowProblem } from '../impact/import-problems';

/** One file of earlier records being brought in, as the import page shows it. */
export interface ImportJobView {
  id: number;
  groupId: number | null;
  scope: 'group' | 'network';
  fileName: string;
  /** 'ords-0.3', 'ords-0.2' or 'plain'. */
  kind: string;
  status: 'queued' | 'running' | 'done' | 'failed';
  /** Records in the file (rows below the header). */
  total: number;
  imported: number;
  /** Already brought in by an earlier import (same data provider and id). */
  skipped: number;
  /** Rows refused, with the first ones in `errors`. */
  refused: number;
  /** Readable records worked through so far. */
  done: number;
  /**
   * The first refused rows: the code of the problem and the file's value, worded by the screen
   * (figures.import.problem.<code>); `message` is the English, and all an import made before codes has.
   */
  errors: { row: number; field: string; code?: RowProblem; value?: string; message: string }[];
  /** Why a stopped job stopped, in the reader's language. */
  message: string | null;
  createdAt: string;
  finishedAt: string | null;
}

export interface ImportPreview {
  kind: 'ords-0.3' | 'ords-0.2' | 'plain';
  encoding: string;
  delimiter: ',' | ';';
  header: string[];
  rows: string[][];
}
