import { createSystem, defaultConfig, defineConfig } from '@chakra-ui/react';

/**
 * Jigwright's own palette (DESIGN.md §5): birch page, graphite text, walnut brand, steel actions,
 * sage success, amber cautions (as borders and icons, never as text on birch), brick errors.
 * Each named colour sits at 600 in its scale; text colours meet WCAG AA on birch and on white.
 */
const palette = (scale: Record<string, string>) =>
  Object.fromEntries(Object.entries(scale).map(([step, value]) => [step, { value }]));

const semanticPalette = (name: string, { solid = 600, fg = 700 }: { solid?: number; fg?: number } = {}) => ({
  solid: { value: `{colors.${name}.${solid}}` },
  contrast: { value: '#FFFFFF' },
  fg: { value: `{colors.${name}.${fg}}` },
  muted: { value: `{colors.${name}.100}` },
  subtle: { value: `{colors.${name}.50}` },
  emphasized: { value: `{colors.${name}.200}` },
  focusRing: { value: `{colors.${name}.500}` },
});

const config = defineConfig({
  globalCss: {
    'html, body': { bg: 'birch', color: 'graphite', fontFeatureSettings: '"tnum" 0' },
    html: { colorPalette: 'steel' },
    'td, .numeric': { fontVariantNumeric: 'tabular-nums' },
  },
  theme: {
    tokens: {
      fonts: {
        heading: { value: '"Work Sans", system-ui, sans-serif' },
        body: { value: '"Work Sans", system-ui, sans-serif' },
      },
      colors: {
        birch: { value: '#F5EEE2' },
        graphite: { value: '#2B2B2B' },
        walnut: palette({
          50: '#F7F1EC',
          100: '#EADBCF',
          200: '#D6B9A3',
          300: '#BE9474',
          400: '#9F6E4B',
          500: '#845636',
          600: '#6B4329',
          700: '#573520',
          800: '#422818',
          900: '#2E1B10',
          950: '#1C1009',
        }),
        steel: palette({
          50: '#EEF4F8',
          100: '#D5E3EC',
          200: '#ADC7D9',
          300: '#7FA6C0',
          400: '#5485A6',
          500: '#3B6D8E',
          600: '#2F5D7C',
          700: '#264B65',
          800: '#1D394D',
          900: '#142836',
          950: '#0B1720',
        }),
        sage: palette({
          50: '#F0F4EF',
          100: '#DAE4D8',
          200: '#B7CAB3',
          300: '#91AD8B',
          400: '#6E8E67',
          500: '#5B7B55',
          600: '#4E6B4A',
          700: '#3F573C',
          800: '#30422E',
          900: '#212E20',
          950: '#141C13',
        }),
        amber: palette({
          50: '#FCF5E8',
          100: '#F7E6C4',
          200: '#EFCD8C',
          300: '#E4B255',
          400: '#D89A2C',
          500: '#CF8F20',
          600: '#C9861A',
          700: '#9C6714',
          800: '#70490E',
          900: '#472E09',
          950: '#2A1B05',
        }),
        brick: palette({
          50: '#FAF0EE',
          100: '#F1D8D4',
          200: '#E3B0A8',
          300: '#D2857A',
          400: '#BE5E51',
          500: '#AF4B3D',
          600: '#A63D2F',
          700: '#863126',
          800: '#64251C',
          900: '#431813',
          950: '#280E0B',
        }),
      },
    },
    semanticTokens: {
      colors: {
        walnut: semanticPalette('walnut'),
        steel: semanticPalette('steel'),
        sage: semanticPalette('sage'),
        // Amber's foreground is its darker step: amber text on birch is too faint.
        amber: semanticPalette('amber', { fg: 800 }),
        brick: semanticPalette('brick'),
        bg: { DEFAULT: { value: '{colors.birch}' }, panel: { value: '#FFFFFF' } },
        fg: { DEFAULT: { value: '{colors.graphite}' }, muted: { value: '#55504A' } },
        border: { DEFAULT: { value: '#D8CFC0' } },
      },
    },
  },
});

export const system = createSystem(defaultConfig, config);
