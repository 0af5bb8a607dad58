/** The panel's look (in code, so the host build and the preview need no style loader). */
export const panelStyles = `
.ebb-panel [hidden] { display: none !important; }
.ebb-panel { font: 14px/1.4 system-ui, "Segoe UI", Roboto, Arial, sans-serif; color: #1d2731; padding: 10px 12px 16px; }
.ebb-title { font-size: 18px; margin: 0 0 2px; color: #24587a; }
.ebb-intro { margin: 0 0 8px; color: #44525f; }
.ebb-cautions { border: 1px solid #e2cf8d; background: #fff8e1; border-radius: 4px; padding: 4px 8px; margin-bottom: 10px; }
.ebb-cautions summary { font-weight: 600; cursor: pointer; }
.ebb-cautions p { margin: 4px 0 2px; font-size: 13px; }
.ebb-form fieldset { border: 1px solid #c9d2da; border-radius: 4px; margin: 0 0 8px; padding: 6px 10px 8px; }
.ebb-form legend { font-weight: 600; color: #24587a; padding: 0 4px; }
.ebb-form fieldset.ebb-constants { border-style: dashed; margin-top: 6px; }
.ebb-field { display: flex; flex-wrap: wrap; align-items: center; gap: 4px 8px; margin: 4px 0; }
.ebb-field label { min-width: 150px; }
.ebb-row4 .ebb-field label { min-width: 46px; }
.ebb-row4 { display: grid; grid-template-columns: 1fr 1fr; gap: 0 10px; }
.ebb-field input[type=text], .ebb-field select { font: inherit; padding: 3px 6px; border: 1px solid #8a99a6; border-radius: 3px; min-width: 0; max-width: 100%; }
.ebb-field input[type=text] { width: 110px; }
.ebb-row4 input[type=text] { width: 80px; }
.ebb-field select { width: 100%; }
.ebb-field input:disabled { background: #eef1f3; color: #555f69; }
.ebb-choice { display: flex; align-items: center; gap: 6px; margin: 4px 0; }
.ebb-hint { font-size: 12.5px; color: #4a5866; margin: 2px 0; }
.ebb-summary { margin: 6px 0 0; font-size: 13px; }
.ebb-button { font: inherit; padding: 5px 12px; border: 1px solid #24587a; background: #fff; color: #1e4a67; border-radius: 4px; cursor: pointer; margin: 2px 4px 2px 0; }
.ebb-button.small { padding: 2px 8px; font-size: 13px; }
.ebb-button.primary { background: #24587a; color: #fff; font-weight: 600; }
.ebb-button.danger { background: #8f2424; border-color: #8f2424; color: #fff; }
.ebb-button:disabled { opacity: 0.55; cursor: default; }
.ebb-button:focus-visible, .ebb-finding:focus-visible, .ebb-field input:focus-visible, .ebb-field select:focus-visible { outline: 2px solid #24587a; outline-offset: 2px; }
.ebb-actions { display: flex; flex-wrap: wrap; gap: 4px; margin: 4px 0; }
.ebb-confirm { border: 2px solid #8f2424; background: #fdf1f1; border-radius: 4px; padding: 6px 10px; margin: 8px 0; }
.ebb-confirm p { margin: 0 0 6px; }
.ebb-progress { display: flex; align-items: center; gap: 8px; margin: 6px 0; font-size: 13px; }
.ebb-progress progress { flex: 0 0 120px; }
.ebb-message { min-height: 20px; margin: 6px 0; font-size: 13.5px; }
.ebb-message[data-tone=error] { color: #8f2424; font-weight: 600; }
.ebb-message[data-tone=done] { color: #1f5b2e; }
.ebb-existing { border-top: 1px solid #c9d2da; margin-top: 10px; padding-top: 6px; }
.ebb-existing h3, .ebb-findings h3 { font-size: 15px; margin: 4px 0; }
.ebb-existing .ebb-field label { min-width: 50px; }
.ebb-existing .ebb-field select { width: auto; flex: 1; }
.ebb-findings-list { list-style: none; padding: 0; margin: 0; max-height: 260px; overflow: auto; }
.ebb-finding { display: block; width: 100%; text-align: left; font: 13px/1.35 inherit; background: #fff; border: 1px solid #d8c2c2; border-radius: 3px; padding: 4px 6px; margin: 2px 0; cursor: pointer; color: #1d2731; }
.ebb-finding:hover { background: #fdf1f1; }
`;
