// Oracle generator (not compiled with the tests): the exact two-sided Fisher p-value of one 5 x 3 table by listing
// every table with its margins (about 1.2e10, the last row determined), with the p <= p_obs * (1 + 1e-7) rule of
// R's fisher.test. Run it as the Program.cs of a console project (net10.0, Release): about 55 s on 2 cores.
// Output on 2026-12-02: total 0.999999999998475, p 0.8168692716558724 (FisherExactRxcTests.DemoRaceTable...).
using System; using System.Collections.Generic; using System.Threading.Tasks;
// Brute-force exact Fisher p for one 5 x 3 table: every table with the margins, last row determined.
int[,] t = { { 2, 1, 1 }, { 36, 33, 39 }, { 12, 9, 17 }, { 6, 6, 5 }, { 93, 101, 89 } };
int R = 5, C = 3; var rows = new int[R]; var cols = new int[C]; int n = 0;
for (int i = 0; i < R; i++) for (int j = 0; j < C; j++) { rows[i] += t[i, j]; cols[j] += t[i, j]; n += t[i, j]; }
var lf = new double[n + 1]; for (int k = 1; k <= n; k++) lf[k] = lf[k - 1] + Math.Log(k);
double cst = -lf[n]; foreach (var r in rows) cst += lf[r]; foreach (var c in cols) cst += lf[c];
double LogP(int[,] x) { double s = cst; for (int i = 0; i < R; i++) for (int j = 0; j < C; j++) s -= lf[x[i, j]]; return s; }
double lp0 = LogP(t); double thr = lp0 + Math.Log(1 + 1e-7);
List<(int a, int b, double w)> Splits(int r) { var l = new List<(int, int, double)>(); for (int a = 0; a <= r; a++) for (int b = 0; a + b <= r; b++) l.Add((a, b, -(lf[a] + lf[b] + lf[r - a - b]))); return l; }
var s0 = Splits(rows[0]); var s1 = Splits(rows[1]); var s2 = Splits(rows[2]); var s3 = Splits(rows[3]);
double total = 0, below = 0; object gate = new();
Parallel.ForEach(s1, x1 => {
  double tot = 0, bel = 0;
  foreach (var x0 in s0) { int a01 = x0.a + x1.a, b01 = x0.b + x1.b, c01 = rows[0] + rows[1] - a01 - b01; if (a01 > cols[0] || b01 > cols[1] || c01 > cols[2]) continue;
    foreach (var x2 in s2) { int a2 = a01 + x2.a, b2 = b01 + x2.b, c2 = c01 + rows[2] - x2.a - x2.b; if (a2 > cols[0] || b2 > cols[1] || c2 > cols[2]) continue; double w012 = cst + x0.w + x1.w + x2.w;
      double inner = 0, innerBelow = 0;
      foreach (var x3 in s3) { int a = cols[0] - a2 - x3.a, b = cols[1] - b2 - x3.b, c = cols[2] - c2 - (rows[3] - x3.a - x3.b); if (a < 0 || b < 0 || c < 0) continue;
        double lp = w012 + x3.w - lf[a] - lf[b] - lf[c]; double p = Math.Exp(lp); inner += p; if (lp <= thr) innerBelow += p; }
      tot += inner; bel += innerBelow; } }
  lock (gate) { total += tot; below += bel; } });
Console.WriteLine($"total {total:R}  p {below:R}  p/total {below / total:R}");
