/**
 * The CSV exports are plain downloads (a link with the session cookie): the browser saves the
 * file under the name the server gives in Content-Disposition.
 */
export type ExportKind = "predictions" | "results";

export const lessonExportUrl = (lessonId: string, kind: ExportKind) => `/api/lessons/${encodeURIComponent(lessonId)}/exports/${kind}.csv`;
