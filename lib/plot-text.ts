/**
 * Plotly reads a subset of HTML in every string it draws (trace names in the legend, hover text, annotations, axis
 * titles and tick labels): `<a href>` becomes a live link and `<span style>` restyles. Text a person wrote goes
 * through here on its way to a plot, so it shows as typed and stays inert; Plotly turns the entities back into
 * characters only after it has split the markup from the text. Markup of our own is added around the result.
 */
export function plotText(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
}
