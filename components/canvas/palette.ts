/** Colours of the plot canvas (our own scheme, tuned for the dark workspace). */
export const palette = {
  background: '#151a22',
  grid: '#222b38',
  outline: '#9fb0c4',
  area: '#6f8fb0',
  settingLine: '#f0b541',
  centreLine: '#7fb8e6',
  label: '#8d9bad',
  position: '#c9d3df',
  selection: '#58c4ff',
  subject: '#e59ad8',
  viewpoint: '#9be0a7',
  measure: '#ffe066',
  open: '#ff8a65',
} as const;
