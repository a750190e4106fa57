ALTER TABLE `bins` ADD `grip_min` real;--> statement-breakpoint
ALTER TABLE `bins` ADD `grip_max` real;--> statement-breakpoint
-- custom:begin
-- Blind bins stocked before the range was kept take the table's band for their grip dash
-- (the same rows as BLIND_GRIP_RANGES in shared/stock/fasteners.ts).
UPDATE `bins` SET
  `grip_min` = CASE `grip16` WHEN 1 THEN 0.020 WHEN 2 THEN 0.063 WHEN 3 THEN 0.126 WHEN 4 THEN 0.188 WHEN 5 THEN 0.251 WHEN 6 THEN 0.313 WHEN 8 THEN 0.376 END,
  `grip_max` = CASE `grip16` WHEN 1 THEN 0.062 WHEN 2 THEN 0.125 WHEN 3 THEN 0.187 WHEN 4 THEN 0.250 WHEN 5 THEN 0.312 WHEN 6 THEN 0.375 WHEN 8 THEN 0.500 END
WHERE `kind` IN ('blind_structural', 'blind_general') AND `grip16` IS NOT NULL;
-- custom:end
