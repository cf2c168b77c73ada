package org.shutline.testnet;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.shutline.model.MainStatus;
import org.shutline.model.Operability;
import org.shutline.model.ValveKind;
import org.shutline.model.Words;

/**
 * Test helper: a network drawn as ASCII art, then directives, separated by a line "--".
 *
 * <pre>
 *   A--1--b>c--2--d        letters are nodes; an upper-case letter also holds a source "S" + letter
 *         |                '-' and '|' are pipe; a run joins two letters and is one main named by
 *         3                its two letters ("ab"), split into "ab.1", "ab.2" by stations
 *         |                a digit d on a run is valve "V"+d, splitting its main there
 *         e                '&gt;' '&lt;' on a horizontal run, '^' (flow up) '!' (flow down) on a vertical
 *                          run are stations "R1", "R2", ... in reading order, one way in the arrow's sense
 * </pre>
 * Cells are 10 m apart (x = column * 10, y = -row * 10). Directives:
 * {@code sys LP c} (the pipe component of node c is system LP; default HP),
 * {@code closed V3}, {@code inoperable V2}, {@code unknown V4}, {@code never V5},
 * {@code checked V5 2024-01-01}, {@code kind V1 station}, {@code status ab abandoned},
 * {@code svc s1 ab 3 [critical-kind]} or {@code svc s1 ab#1 3} (service on piece 1 of
 * main ab with 3 meters), {@code loose V7 c d} (a valve straight between nodes c and d),
 * {@code tol 20} (point tolerance in metres).
 */
public final class AsciiNet {
    private AsciiNet() {}

    private static final double CELL = 10;

    private record Piece(String id, int start, List<NetSketch.Stop> stops, int end) {}

    public static TestNet parse(String text) {
        String[] parts = text.split("\n--\n", 2);
        String[] art = parts[0].split("\n", -1);
        String[] directives = parts.length > 1 ? parts[1].split("\n") : new String[0];
        NetSketch sk = new NetSketch();
        Map<String, Integer> nodes = new LinkedHashMap<>();
        Map<Long, Integer> cellNode = new HashMap<>();
        char[][] grid = new char[art.length][];
        for (int r = 0; r < art.length; r++) grid[r] = art[r].toCharArray();
        for (int r = 0; r < grid.length; r++) {
            for (int c = 0; c < grid[r].length; c++) {
                char ch = grid[r][c];
                if (!Character.isLetter(ch)) continue;
                String name = String.valueOf(Character.toLowerCase(ch));
                if (nodes.containsKey(name)) throw new IllegalArgumentException("node " + name + " drawn twice");
                int n = sk.node(c * CELL, -r * CELL);
                nodes.put(name, n);
                cellNode.put(key(r, c), n);
                if (Character.isUpperCase(ch)) sk.source("S" + name, n);
            }
        }
        // station numbering in reading order
        Map<Long, String> stationAt = new HashMap<>();
        int st = 0;
        for (int r = 0; r < grid.length; r++) {
            for (int c = 0; c < grid[r].length; c++) {
                if ("<>^!".indexOf(grid[r][c]) >= 0) stationAt.put(key(r, c), "R" + (++st));
            }
        }
        List<Piece> pieces = new ArrayList<>();
        List<String[]> stationDefs = new ArrayList<>(); // id, inlet node, outlet node
        for (int r = 0; r < grid.length; r++) {
            for (int c = 0; c < grid[r].length; c++) {
                if (!Character.isLetter(grid[r][c])) continue;
                if (at(grid, r, c + 1) != 0 && "-<>123456789".indexOf(at(grid, r, c + 1)) >= 0) {
                    run(grid, r, c, 0, 1, sk, cellNode, stationAt, pieces, stationDefs);
                }
                if (at(grid, r + 1, c) != 0 && "|^!123456789".indexOf(at(grid, r + 1, c)) >= 0) {
                    run(grid, r, c, 1, 0, sk, cellNode, stationAt, pieces, stationDefs);
                }
            }
        }
        // systems: union of pipe components
        int n = sk.nodeCountForTests();
        int[] parent = new int[n];
        for (int i = 0; i < n; i++) parent[i] = i;
        for (Piece p : pieces) union(parent, p.start(), p.end());
        Map<Integer, String> rootSys = new HashMap<>();
        Map<String, MainStatus> status = new HashMap<>();
        List<String[]> services = new ArrayList<>();
        List<String[]> looseValves = new ArrayList<>();
        for (String line : directives) {
            String[] w = line.trim().split("\\s+");
            if (w.length == 0 || w[0].isEmpty() || w[0].startsWith("#")) continue;
            switch (w[0]) {
                case "sys" -> rootSys.put(find(parent, node(nodes, w[2])), w[1]);
                case "closed" -> sk.closed(w[1]);
                case "inoperable" -> sk.operable(w[1], Operability.NO);
                case "unknown" -> sk.operable(w[1], Operability.UNKNOWN);
                case "never" -> sk.neverChecked(w[1]);
                case "checked" -> sk.checked(w[1], LocalDate.parse(w[2]));
                case "kind" -> sk.kind(w[1], Words.parse(ValveKind.class, w[2]).orElseThrow());
                case "status" -> status.put(w[1], Words.parse(MainStatus.class, w[2]).orElseThrow());
                case "svc" -> services.add(w);
                case "loose" -> looseValves.add(w);
                case "tol" -> sk.pointTolerance(Double.parseDouble(w[1]));
                default -> throw new IllegalArgumentException("unknown directive: " + line);
            }
        }
        for (Piece p : pieces) {
            List<NetSketch.Stop> stops = new ArrayList<>();
            stops.add(NetSketch.Stop.node(p.start()));
            stops.addAll(p.stops());
            stops.add(NetSketch.Stop.node(p.end()));
            sk.main(p.id(), rootSys.getOrDefault(find(parent, p.start()), "HP"),
                    status.getOrDefault(p.id(), MainStatus.ACTIVE), stops);
        }
        for (String[] s : stationDefs) {
            int in = Integer.parseInt(s[1]), out = Integer.parseInt(s[2]);
            sk.station(s[0], rootSys.getOrDefault(find(parent, in), "HP"),
                    rootSys.getOrDefault(find(parent, out), "HP"), in, out);
        }
        for (String[] w : looseValves) {
            int a = node(nodes, w[2]);
            sk.valveBetween(w[1], rootSys.getOrDefault(find(parent, a), "HP"), a, node(nodes, w[3]));
        }
        for (String[] w : services) {
            String main = w[2];
            int piece = 0;
            int hash = main.indexOf('#');
            if (hash >= 0) {
                piece = Integer.parseInt(main.substring(hash + 1));
                main = main.substring(0, hash);
            }
            sk.service(w[1], main, piece, Integer.parseInt(w[3]), w.length > 4 ? w[4] : null);
        }
        return new TestNet(sk.build(), nodes);
    }

    private static int node(Map<String, Integer> nodes, String name) {
        Integer n = nodes.get(name.toLowerCase(Locale.ROOT));
        if (n == null) throw new IllegalArgumentException("no node " + name);
        return n;
    }

    private static void run(char[][] g, int r0, int c0, int dr, int dc, NetSketch sk, Map<Long, Integer> cellNode,
                            Map<Long, String> stationAt, List<Piece> pieces, List<String[]> stations) {
        String startName = String.valueOf(Character.toLowerCase(g[r0][c0]));
        int start = cellNode.get(key(r0, c0));
        List<NetSketch.Stop> stops = new ArrayList<>();
        List<Object[]> segs = new ArrayList<>(); // start node, stops, end node
        int r = r0 + dr, c = c0 + dc;
        while (true) {
            char ch = at(g, r, c);
            if (ch == 0) throw new IllegalArgumentException("run from " + startName + " ends in nothing at " + r + "," + c);
            if (Character.isLetter(ch)) break;
            if (Character.isDigit(ch)) {
                stops.add(NetSketch.Stop.valve("V" + ch, c * CELL, -r * CELL));
            } else if ("<>^!".indexOf(ch) >= 0) {
                int a = sk.node(c * CELL, -r * CELL);
                int b = sk.node(c * CELL, -r * CELL);
                // a: end of the piece before (left/upper), b: start of the piece after
                boolean forward = ch == '>' || ch == '!';
                stations.add(new String[] {stationAt.get(key(r, c)), String.valueOf(forward ? a : b),
                    String.valueOf(forward ? b : a)});
                segs.add(new Object[] {start, new ArrayList<>(stops), a});
                stops.clear();
                start = b;
            } else if (ch != '-' && ch != '|') {
                throw new IllegalArgumentException("unexpected '" + ch + "' on a run at " + r + "," + c);
            }
            r += dr;
            c += dc;
        }
        String name = startName + Character.toLowerCase(g[r][c]);
        segs.add(new Object[] {start, new ArrayList<>(stops), cellNode.get(key(r, c))});
        for (int i = 0; i < segs.size(); i++) {
            Object[] s = segs.get(i);
            @SuppressWarnings("unchecked")
            List<NetSketch.Stop> st = (List<NetSketch.Stop>) s[1];
            pieces.add(new Piece(segs.size() == 1 ? name : name + "." + (i + 1), (Integer) s[0], st, (Integer) s[2]));
        }
    }

    private static char at(char[][] g, int r, int c) {
        if (r < 0 || r >= g.length || c < 0 || c >= g[r].length) return 0;
        char ch = g[r][c];
        return ch == ' ' ? 0 : ch;
    }

    private static long key(int r, int c) {
        return ((long) r << 32) | (c & 0xffffffffL);
    }

    private static int find(int[] p, int x) {
        while (p[x] != x) x = p[x] = p[p[x]];
        return x;
    }

    private static void union(int[] p, int a, int b) {
        int x = find(p, a), y = find(p, b);
        if (x != y) p[Math.max(x, y)] = Math.min(x, y);
    }
}
