"use client";
// The live OpenAPI document rendered by swagger-ui. Try-it is on only for signed-in members allowed to
// use it, and only with sandbox keys: a live key typed into a browser page is a key at risk.
import { useEffect, useRef, useState } from "react";
import "swagger-ui-react/swagger-ui.css";

interface SwaggerRequest {
  headers: Record<string, string>;
  url: string;
}

type SwaggerUIBundle = (options: Record<string, unknown>) => unknown;

declare global {
  interface Window {
    SwaggerUIBundle?: SwaggerUIBundle;
  }
}

export function refuseLiveKeys(req: SwaggerRequest): SwaggerRequest {
  const auth = Object.entries(req.headers).find(([k]) => k.toLowerCase() === "authorization")?.[1] ?? "";
  if (/\bgg_live_/.test(auth)) {
    throw new Error("Live keys are not accepted on this page. Use a sandbox key (gg_sbx_…) from the console's API keys page.");
  }
  return req;
}

// The prebuilt bundle (see ./swagger-ui-bundle.js/route.ts), loaded once per page view.
function loadBundle(): Promise<SwaggerUIBundle> {
  if (window.SwaggerUIBundle) return Promise.resolve(window.SwaggerUIBundle);
  return new Promise((resolve, reject) => {
    const s = document.createElement("script");
    s.src = "/docs/api/swagger-ui-bundle.js";
    s.async = true;
    s.onload = () => (window.SwaggerUIBundle ? resolve(window.SwaggerUIBundle) : reject(new Error("swagger-ui did not load")));
    s.onerror = () => reject(new Error("swagger-ui did not load"));
    document.head.appendChild(s);
  });
}

export function SwaggerView({ canTry }: { canTry: boolean }) {
  const ref = useRef<HTMLDivElement>(null);
  const [state, setState] = useState<"loading" | "ready" | "failed">("loading");

  useEffect(() => {
    let cancelled = false;
    loadBundle()
      .then((SwaggerUI) => {
        if (cancelled || !ref.current) return;
        SwaggerUI({
          domNode: ref.current,
          url: "/api/v1/openapi.json",
          docExpansion: "list",
          defaultModelsExpandDepth: 0,
          persistAuthorization: false,
          tryItOutEnabled: false,
          supportedSubmitMethods: canTry ? ["get", "post"] : [],
          requestInterceptor: refuseLiveKeys,
          onComplete: () => !cancelled && setState("ready"),
        });
      })
      .catch(() => !cancelled && setState("failed"));
    return () => {
      cancelled = true;
    };
  }, [canTry]);

  return (
    <div>
      {state === "loading" && (
        <p className="p-6 text-sm text-ink-600" role="status">
          Loading the API reference…
        </p>
      )}
      {state === "failed" && (
        <p className="p-6 text-sm text-verdict-fail" role="alert">
          The interactive reference could not load. The document itself is at{" "}
          <a className="underline" href="/api/v1/openapi.json">/api/v1/openapi.json</a>.
        </p>
      )}
      <div ref={ref} className="gg-swagger" />
    </div>
  );
}
