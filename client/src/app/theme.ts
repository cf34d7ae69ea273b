import { createTheme, type MantineColorsTuple } from '@mantine/core';

// Channelwright's own palette: a petrol blue for the working colour, an oxide copper for cautions,
// and blue-leaning greys for the dark scheme, so long sessions stay calm on the eyes.
const channel: MantineColorsTuple = [
  '#e9f5f7', '#d5e9ed', '#a8d2db', '#78bac8', '#52a6b7', '#3a99ad', '#2b91a7', '#1c7d92', '#0d6f83', '#005f71',
];

const oxide: MantineColorsTuple = [
  '#fdf3ea', '#f6e5d6', '#ebc9aa', '#e0ab7b', '#d69253', '#d0823a', '#ce792c', '#b5671f', '#a15b18', '#8c4c0e',
];

const dark: MantineColorsTuple = [
  '#c8ced6', '#a9b1bc', '#8a94a2', '#606a78', '#3e4652', '#2d343e', '#232a33', '#1b2129', '#151a21', '#0f1318',
];

export const theme = createTheme({
  colors: { channel, oxide, dark },
  primaryColor: 'channel',
  primaryShade: { light: 8, dark: 5 },
  fontFamily: 'Inter, system-ui, -apple-system, "Segoe UI", sans-serif',
  fontFamilyMonospace: 'ui-monospace, "SFMono-Regular", "DejaVu Sans Mono", Menlo, monospace',
  headings: {
    fontFamily: 'Inter, system-ui, -apple-system, "Segoe UI", sans-serif',
    fontWeight: '600',
  },
  defaultRadius: 'sm',
  cursorType: 'pointer',
  autoContrast: true,
});
