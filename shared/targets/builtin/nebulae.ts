import type { BuiltinRow } from '@/shared/targets/builtin/row';

/*
 * Bright nebulae popular with imagers (emission, reflection, supernova remnants, nebulae with
 * their clusters), outside the Messier list. Published J2000 positions from general astronomical
 * knowledge; each is checked against OpenNGC by tests/unit/targets-builtin.test.ts.
 */
export const NEBULA_ROWS: readonly BuiltinRow[] = [
  ['NGC 7000', [], 'North America Nebula', 'emission-nebula', '20:59:17', '+44:31:44', 120, 100, null, 4.0],
  ['IC 1396', [], 'Elephant Trunk Nebula', 'cluster-with-nebula', '21:39:06', '+57:30:00', 170, 140, null, 3.5],
  ['NGC 6992', [], 'Eastern Veil Nebula', 'supernova-remnant', '20:56:24', '+31:43:00', 60, 8, null, 7.0],
  ['NGC 6995', [], 'Eastern Veil Nebula (south)', 'supernova-remnant', '20:57:10', '+31:14:00', 12, 12, null, 7.0],
  ['NGC 2023', [], '', 'reflection-nebula', '05:41:38', '-02:15:33', 10, 10, null, null],
  ['IC 434', [], 'Horsehead region', 'emission-nebula', '05:40:59', '-02:27:30', 60, 10, null, null],
  ['NGC 2244', [], 'Rosette Cluster', 'open-cluster', '06:31:55', '+04:56:30', 24, null, null, 4.8],
  ['NGC 281', [], 'Pacman Nebula', 'emission-nebula', '00:52:59.3', '+56:37:19', 35, 30, null, 7.4],
  ['IC 1805', [], 'Heart Nebula', 'cluster-with-nebula', '02:32:42', '+61:27:00', 150, 150, null, 6.5],
  ['IC 1848', [], 'Soul Nebula', 'cluster-with-nebula', '02:51:12', '+60:25:00', 150, 75, null, 6.5],
  ['NGC 7635', [], 'Bubble Nebula', 'emission-nebula', '23:20:48.3', '+61:12:06', 15, 8, null, 10.0],
  ['NGC 6888', [], 'Crescent Nebula', 'emission-nebula', '20:12:07', '+38:21:18', 18, 12, null, 7.4],
  ['IC 5146', [], 'Cocoon Nebula', 'cluster-with-nebula', '21:53:24', '+47:16:00', 12, 12, null, 7.2],
  ['IC 405', [], 'Flaming Star Nebula', 'emission-nebula', '05:16:29', '+34:21:22', 37, 19, null, 6.0],
  ['NGC 7380', [], 'Wizard Nebula', 'cluster-with-nebula', '22:47:21', '+58:07:54', 25, 25, null, 7.2],
  ['NGC 6820', [], '', 'emission-nebula', '19:42:28', '+23:05:16', 40, 30, null, null],
  ['NGC 6823', [], '', 'open-cluster', '19:43:10', '+23:18:00', 12, null, null, 7.1],
  ['NGC 3372', [], 'Carina Nebula', 'emission-nebula', '10:45:08.5', '-59:52:04', 120, 120, null, 1.0],
  ['NGC 1977', [], 'Running Man Nebula', 'reflection-nebula', '05:35:16', '-04:50:40', 20, 10, null, 7.0],
  ['NGC 1999', [], '', 'reflection-nebula', '05:36:25.3', '-06:42:57', 2, 2, null, 9.5],
  ['NGC 7023', [], 'Iris Nebula', 'reflection-nebula', '21:01:36', '+68:10:00', 18, 18, null, 6.8],
  ['NGC 7129', [], '', 'reflection-nebula', '21:42:59', '+66:06:00', 7, 7, null, 11.5],
  ['NGC 2359', [], "Thor's Helmet", 'emission-nebula', '07:18:30', '-13:13:48', 16, 8, null, 11.5],
  ['NGC 2070', [], 'Tarantula Nebula', 'emission-nebula', '05:38:42', '-69:06:03', 40, 25, null, 8.0],
  ['NGC 6334', [], "Cat's Paw Nebula", 'emission-nebula', '17:20:50.9', '-36:06:54', 35, 20, null, null],
  ['NGC 6357', [], 'Lobster Nebula', 'emission-nebula', '17:24:43', '-34:12:06', 50, 40, null, null],
  ['NGC 1491', [], '', 'emission-nebula', '04:03:15.9', '+51:18:54', 25, 25, null, null],
  ['IC 4604', [], 'Rho Ophiuchi Nebula', 'reflection-nebula', '16:25:35', '-23:26:49', 60, 25, null, null],
  ['NGC 1435', [], 'Merope Nebula', 'reflection-nebula', '03:46:10', '+23:45:54', 30, 30, null, null],
  ['IC 63', [], 'Ghost of Cassiopeia', 'emission-nebula', '00:59:29', '+60:54:42', 10, 3, null, null],
  ['NGC 1931', [], '', 'cluster-with-nebula', '05:31:26', '+34:14:42', 3, 3, null, 10.1],
  ['NGC 6726', [], '', 'reflection-nebula', '19:01:39', '-36:53:30', 9, 7, null, null],
  ['NGC 2261', [], "Hubble's Variable Nebula", 'reflection-nebula', '06:39:09.5', '+08:44:40', 2, 1, null, 10.0],
  ['NGC 3603', [], '', 'cluster-with-nebula', '11:15:09.1', '-61:15:17', 12, 12, null, 9.1],
  ['NGC 2736', [], 'Pencil Nebula', 'supernova-remnant', '09:00:17', '-45:54:57', 30, 7, null, 12.0],
  ['NGC 2467', [], '', 'emission-nebula', '07:52:19', '-26:26:30', 8, 7, null, 7.1],
  ['NGC 6530', [], '', 'open-cluster', '18:04:31', '-24:21:30', 15, null, null, 4.6],
];
