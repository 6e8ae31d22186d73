-- Each commission holds its trail's head (last seq and hash), so a chain cut short at the end is caught.
ALTER TABLE `commissions` ADD `trail_head_seq` int unsigned NOT NULL DEFAULT 0, ADD `trail_head_hash` varchar(64) NOT NULL DEFAULT '0000000000000000000000000000000000000000000000000000000000000000';
--> statement-breakpoint
-- Existing chains: the head is their last event.
UPDATE `commissions` c
  JOIN (SELECT `commission_id`, MAX(`seq`) AS `seq` FROM `trail_events` GROUP BY `commission_id`) m ON m.`commission_id` = c.`id`
  JOIN `trail_events` t ON t.`commission_id` = m.`commission_id` AND t.`seq` = m.`seq`
  SET c.`trail_head_seq` = t.`seq`, c.`trail_head_hash` = t.`hash`;
--> statement-breakpoint
-- The head only moves forward, one event at a time, onto an event that exists: the app's user cannot
-- wind it back to match a shortened chain.
CREATE TRIGGER commissions_trail_head_forward BEFORE UPDATE ON commissions FOR EACH ROW
BEGIN
  IF NEW.trail_head_seq <> OLD.trail_head_seq OR NEW.trail_head_hash <> OLD.trail_head_hash THEN
    IF NEW.trail_head_seq <> OLD.trail_head_seq + 1 OR NOT EXISTS (
      SELECT 1 FROM trail_events WHERE commission_id = NEW.id AND seq = NEW.trail_head_seq AND hash = NEW.trail_head_hash
    ) THEN
      SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'commissions.trail_head moves only forward, to the event just appended';
    END IF;
  END IF;
END
--> statement-breakpoint
CREATE TRIGGER commissions_trail_head_start BEFORE INSERT ON commissions FOR EACH ROW
BEGIN
  IF NEW.trail_head_seq <> 0 OR NEW.trail_head_hash <> '0000000000000000000000000000000000000000000000000000000000000000' THEN
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'a new commission starts with an empty trail head';
  END IF;
END
