"use client";
// The live OpenAPI document rendered by swagger-ui. Try-it is on only for signed-in members allowed to
// use it, and only with sandbox keys: a live key typed into a browser page is a key at risk.
import dynamic from "next/dynamic";
import "swagger-ui-react/swagger-ui.css";

const SwaggerUI = dynamic(() => import("swagger-ui-react"), {
  ssr: false,
  loading: () => <p className="p-6 text-sm text-ink-600" role="status">Loading the API reference…</p>,
});

interface SwaggerRequest {
  headers: Record<string, string>;
  url: string;
}

export function refuseLiveKeys(req: SwaggerRequest): SwaggerRequest {
  const auth = Object.entries(req.headers).find(([k]) => k.toLowerCase() === "authorization")?.[1] ?? "";
  if (/\bgg_live_/.test(auth)) {
    throw new Error("Live keys are not accepted on this page. Use a sandbox key (gg_sbx_…) from the console's API keys page.");
  }
  return req;
}

export function SwaggerView({ canTry }: { canTry: boolean }) {
  return (
    <div className="gg-swagger">
      <SwaggerUI
        url="/api/v1/openapi.json"
        docExpansion="list"
        defaultModelsExpandDepth={0}
        persistAuthorization={false}
        tryItOutEnabled={false}
        supportedSubmitMethods={canTry ? ["get", "post"] : []}
        requestInterceptor={refuseLiveKeys as never}
      />
    </div>
  );
}
