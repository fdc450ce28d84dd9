// Chart colours from the Kerfwise palette (app/globals.css), as hex for SVG attributes.
export const CHART = {
  spruce: '#1d5545',
  spruceSoft: '#7fae9c',
  amber: '#b86a12',
  brick: '#a3271f',
  bark: '#5b4a3a',
  grain: '#d9c6a5',
};

export const shortWeek = (week: string) =>
  new Date(`${week}T00:00:00Z`).toLocaleDateString('en-GB', {
    day: 'numeric',
    month: 'short',
    timeZone: 'UTC',
  });
export const metres = (mm: number) => Math.round(mm / 100) / 10;
export const pounds = (pence: number) => Math.round(pence) / 100;
