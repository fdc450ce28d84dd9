// Legend words in the body colour: the series colour stays in the swatch, where it need not be read.
export const legendText = (value: unknown) => <span className="text-bark">{String(value)}</span>;
