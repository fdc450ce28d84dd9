-- Saved plans keep their figures as JSON; rewrite the plans stored before these names changed.
-- plans.totals: "kerfMm" (the length lost to saw cuts over the plan) becomes "kerfLossMm", so kerfMm
-- only ever means the blade's width.
UPDATE "plans"
SET "totals" = ("totals" - 'kerfMm') || jsonb_build_object('kerfLossMm', "totals" -> 'kerfMm')
WHERE "totals" ? 'kerfMm';--> statement-breakpoint
-- plans.price: pounds as decimals become whole pence. The stored pounds were whole pence divided by
-- 100, so rounding the exact numeric value gives back the pence they came from.
UPDATE "plans"
SET "price" = jsonb_build_object(
  'lines', COALESCE(
    (
      SELECT jsonb_agg(
        (l.line - 'unitPrice' - 'amount') || jsonb_build_object(
          'unitPence', round((l.line ->> 'unitPrice')::numeric * 100)::integer,
          'amountPence', round((l.line ->> 'amount')::numeric * 100)::integer
        )
        ORDER BY l.n
      )
      FROM jsonb_array_elements("price" -> 'lines') WITH ORDINALITY AS l(line, n)
    ),
    '[]'::jsonb
  ),
  'materialsPence', round(("price" ->> 'materials')::numeric * 100)::integer,
  'cuttingPence', round(("price" ->> 'cutting')::numeric * 100)::integer,
  'totalPence', round(("price" ->> 'total')::numeric * 100)::integer
)
WHERE jsonb_typeof("price") = 'object' AND "price" ? 'total';
