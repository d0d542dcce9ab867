import type { BuiltinRow } from '@/shared/targets/builtin/row';

/*
 * Open and globular clusters outside the Messier list. Published J2000 centres from general
 * astronomical knowledge (open-cluster centres differ between catalogues by arcminutes); checked
 * against OpenNGC by tests/unit/targets-builtin.test.ts.
 */
export const CLUSTER_ROWS: readonly BuiltinRow[] = [
  ['NGC 869', [], 'h Persei', 'open-cluster', '02:19:00', '+57:08:00', 30, null, null, 5.3],
  ['NGC 884', [], 'chi Persei', 'open-cluster', '02:22:24', '+57:07:00', 30, null, null, 6.1],
  ['NGC 7789', [], "Caroline's Rose", 'open-cluster', '23:57:24', '+56:42:30', 16, null, null, 6.7],
  ['NGC 457', [], 'Owl Cluster', 'open-cluster', '01:19:33', '+58:17:24', 13, null, null, 6.4],
  ['NGC 663', [], '', 'open-cluster', '01:46:09', '+61:14:06', 16, null, null, 7.1],
  ['NGC 1502', [], '', 'open-cluster', '04:07:50', '+62:19:54', 8, null, null, 6.9],
  ['NGC 2158', [], '', 'open-cluster', '06:07:25', '+24:05:48', 5, null, null, 8.6],
  ['NGC 2362', [], 'Tau Canis Majoris Cluster', 'open-cluster', '07:18:42', '-24:57:18', 8, null, null, 4.1],
  ['NGC 3532', [], 'Wishing Well Cluster', 'open-cluster', '11:05:39', '-58:45:12', 55, null, null, 3.0],
  ['NGC 4755', [], 'Jewel Box', 'open-cluster', '12:53:39', '-60:21:42', 10, null, null, 4.2],
  ['NGC 6231', [], '', 'open-cluster', '16:54:10', '-41:49:30', 15, null, null, 2.6],
  ['NGC 6633', [], '', 'open-cluster', '18:27:15', '+06:30:30', 27, null, null, 4.6],
  ['NGC 6940', [], '', 'open-cluster', '20:34:26', '+28:17:00', 25, null, null, 6.3],
  ['IC 2602', [], 'Southern Pleiades', 'open-cluster', '10:42:58', '-64:24:00', 50, null, null, 1.9],
  ['NGC 1981', [], '', 'open-cluster', '05:35:09', '-04:26:00', 25, null, null, 4.2],
  ['NGC 5139', [], 'Omega Centauri', 'globular-cluster', '13:26:47.3', '-47:28:46', 36, null, null, 3.9],
  ['NGC 104', [], '47 Tucanae', 'globular-cluster', '00:24:05.7', '-72:04:53', 31, null, null, 4.1],
  ['NGC 6397', [], '', 'globular-cluster', '17:40:42.1', '-53:40:27', 31, null, null, 5.7],
  ['NGC 6752', [], '', 'globular-cluster', '19:10:52.1', '-59:59:04', 20, null, null, 5.4],
  ['NGC 362', [], '', 'globular-cluster', '01:03:14.3', '-70:50:56', 13, null, null, 6.4],
  ['NGC 2808', [], '', 'globular-cluster', '09:12:03.1', '-64:51:49', 14, null, null, 6.2],
  ['NGC 6541', [], '', 'globular-cluster', '18:08:02.4', '-43:42:54', 13, null, null, 6.3],
  ['NGC 3201', [], '', 'globular-cluster', '10:17:36.8', '-46:24:44', 20, null, null, 6.9],
  ['NGC 4833', [], '', 'globular-cluster', '12:59:33.9', '-70:52:35', 14, null, null, 7.8],
  ['NGC 7006', [], '', 'globular-cluster', '21:01:29.4', '+16:11:14', 3.6, null, null, 10.6],
  ['NGC 6229', [], '', 'globular-cluster', '16:46:58.9', '+47:31:40', 4.5, null, null, 9.4],
  ['NGC 2419', [], 'Intergalactic Wanderer', 'globular-cluster', '07:38:08.5', '+38:52:55', 4.1, null, null, 10.4],
  ['NGC 4147', [], '', 'globular-cluster', '12:10:06.3', '+18:32:33', 4.4, null, null, 10.3],
  ['NGC 5466', [], '', 'globular-cluster', '14:05:27.3', '+28:32:04', 11, null, null, 9.0],
  ['NGC 5053', [], '', 'globular-cluster', '13:16:27.1', '+17:42:01', 10.5, null, null, 9.5],
  ['NGC 288', [], '', 'globular-cluster', '00:52:45.2', '-26:34:57', 13, null, null, 8.1],
  ['NGC 1851', [], '', 'globular-cluster', '05:14:06.8', '-40:02:48', 11, null, null, 7.1],
  ['NGC 6934', [], '', 'globular-cluster', '20:34:11.4', '+07:24:16', 7.1, null, null, 8.8],
];
