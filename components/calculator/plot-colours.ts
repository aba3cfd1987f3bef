/** The plot colours repeat the Tailwind palette's hex values: Plotly cannot read CSS variables. */
export const PLOT_COLOURS = {
  ink: '#1b2430',
  muted: '#8a94a3',
  rule: '#d8d2c4',
  cord: '#1f6f78',
  brass: '#a9771a',
  flare: '#b4461a',
  water: '#c8e3e6',
} as const;
