import localFont from "next/font/local";

// Shipped from the @fontsource-variable/inter npm package: nothing is fetched at build or run time.
export const inter = localFont({
  src: "../node_modules/@fontsource-variable/inter/files/inter-latin-wght-normal.woff2",
  weight: "100 900",
  variable: "--font-inter",
  display: "swap",
});
