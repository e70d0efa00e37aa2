// SWR fetcher for the console routes: throws an error carrying the problem+json detail, so tables can
// show what went wrong instead of a blank.
export class FetchError extends Error {
  constructor(message: string, readonly status: number) {
    super(message);
  }
}

export async function fetchJson<T>(url: string): Promise<T> {
  const res = await fetch(url, { headers: { accept: "application/json" } });
  if (!res.ok) {
    let detail = `${res.status} ${res.statusText}`;
    try {
      const body = await res.json();
      if (body?.detail) detail = body.detail;
    } catch {
      /* not JSON */
    }
    throw new FetchError(detail, res.status);
  }
  return res.json() as Promise<T>;
}
