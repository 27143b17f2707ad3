-- R*Tree indexes over parcel and building bounds (working CRS), kept in step by triggers so
-- every insert, delete (including foreign-key cascades from layers) and update reaches them.
CREATE VIRTUAL TABLE `parcels_rtree` USING rtree(`id`, `min_x`, `max_x`, `min_y`, `max_y`);
--> statement-breakpoint
CREATE TRIGGER `parcels_rtree_insert` AFTER INSERT ON `parcels` BEGIN
  INSERT INTO `parcels_rtree` (`id`, `min_x`, `max_x`, `min_y`, `max_y`) VALUES (new.`id`, new.`min_x`, new.`max_x`, new.`min_y`, new.`max_y`);
END;
--> statement-breakpoint
CREATE TRIGGER `parcels_rtree_delete` AFTER DELETE ON `parcels` BEGIN
  DELETE FROM `parcels_rtree` WHERE `id` = old.`id`;
END;
--> statement-breakpoint
CREATE TRIGGER `parcels_rtree_update` AFTER UPDATE OF `min_x`, `min_y`, `max_x`, `max_y` ON `parcels` BEGIN
  UPDATE `parcels_rtree` SET `min_x` = new.`min_x`, `max_x` = new.`max_x`, `min_y` = new.`min_y`, `max_y` = new.`max_y` WHERE `id` = new.`id`;
END;
--> statement-breakpoint
CREATE VIRTUAL TABLE `buildings_rtree` USING rtree(`id`, `min_x`, `max_x`, `min_y`, `max_y`);
--> statement-breakpoint
CREATE TRIGGER `buildings_rtree_insert` AFTER INSERT ON `buildings` BEGIN
  INSERT INTO `buildings_rtree` (`id`, `min_x`, `max_x`, `min_y`, `max_y`) VALUES (new.`id`, new.`min_x`, new.`max_x`, new.`min_y`, new.`max_y`);
END;
--> statement-breakpoint
CREATE TRIGGER `buildings_rtree_delete` AFTER DELETE ON `buildings` BEGIN
  DELETE FROM `buildings_rtree` WHERE `id` = old.`id`;
END;
--> statement-breakpoint
CREATE TRIGGER `buildings_rtree_update` AFTER UPDATE OF `min_x`, `min_y`, `max_x`, `max_y` ON `buildings` BEGIN
  UPDATE `buildings_rtree` SET `min_x` = new.`min_x`, `max_x` = new.`max_x`, `min_y` = new.`min_y`, `max_y` = new.`max_y` WHERE `id` = new.`id`;
END;
