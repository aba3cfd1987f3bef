// plotly.js-dist-min is the prebuilt bundle of plotly.js; its API and types are those of plotly.js.
declare module 'plotly.js-dist-min' {
  import * as Plotly from 'plotly.js';
  export default Plotly;
}
