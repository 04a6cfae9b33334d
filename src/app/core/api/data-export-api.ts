import { HttpClient, HttpErrorResponse, type HttpResponse } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { catchError, from, map, Observable, switchMap, throwError } from 'rxjs';

/** A file the API sent for saving: its bytes and the name the server gave it. */
export interface DownloadedFile {
  blob: Blob;
  filename: string;
}

/**
 * The club's data as one ZIP: GET /api/club/export (the head of coaching) and
 * GET /api/teams/:id/export (the head of coaching or the team's coach).
 */
@Injectable({ providedIn: 'root' })
export class DataExportApi {
  private readonly http = inject(HttpClient);

  /** Everything the club holds. */
  club(): Observable<DownloadedFile> {
    return this.zip('/api/club/export');
  }

  /** One team's part. */
  team(teamId: string): Observable<DownloadedFile> {
    return this.zip(`/api/teams/${encodeURIComponent(teamId)}/export`);
  }

  private zip(url: string): Observable<DownloadedFile> {
    return this.http.get(url, { observe: 'response', responseType: 'blob' }).pipe(
      map((response) => ({ blob: response.body ?? new Blob(), filename: filenameOf(response) })),
      catchError((error: unknown) =>
        from(withProblemBody(error)).pipe(switchMap((e) => throwError(() => e))),
      ),
    );
  }
}

/** The name in Content-Disposition (the server keeps it ASCII), else a plain one. */
function filenameOf(response: HttpResponse<Blob>): string {
  const header = response.headers.get('content-disposition') ?? '';
  return /filename="([^"]+)"/.exec(header)?.[1] ?? 'conewise-data.zip';
}

/**
 * A refusal asked for as a blob arrives as a blob: read its problem+json back into the error, so
 * the person reads the server's own words.
 */
async function withProblemBody(error: unknown): Promise<unknown> {
  if (!(error instanceof HttpErrorResponse) || !(error.error instanceof Blob)) return error;
  try {
    const body: unknown = JSON.parse(await blobText(error.error));
    return new HttpErrorResponse({
      error: body,
      headers: error.headers,
      status: error.status,
      statusText: error.statusText,
      url: error.url ?? undefined,
    });
  } catch {
    return error;
  }
}

/** A blob's text; FileReader, which every browser and the test DOM have. */
function blobText(blob: Blob): Promise<string> {
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(String(reader.result));
    reader.onerror = () => reject(reader.error);
    reader.readAsText(blob);
  });
}
