/** Build-time inputs of the preview page (see build/webpackPreview.ts). */
declare module "*.csv" {
  const text: string;
  export default text;
}
/** DEMO_NOTICE from src/preview/demo/generate-demo.ts, put in at build time (that file needs Node). */
declare const EBB_DEMO_NOTICE: string;
