/* Stencils: a 3-point binary32 smoothing and a 5-point binary64 Laplacian on a 2-D grid. */
#include "runtime.h"
#define N 517
#define R 19
#define C 41
float u[N], v[N];
double g[R * C], h[R * C];

__attribute__((noinline)) void smooth(int n, const float *in, float *out) {
  for (int i = 1; i < n - 1; i++) out[i] = 0.25f * in[i - 1] + 0.5f * in[i] + 0.25f * in[i + 1];
}

__attribute__((noinline)) void laplace(int rows, int cols, const double *in, double *out) {
  for (int r = 1; r < rows - 1; r++)
    for (int c = 1; c < cols - 1; c++)
      out[r * cols + c] = in[(r - 1) * cols + c] + in[(r + 1) * cols + c] + in[r * cols + c - 1] + in[r * cols + c + 1] - 4.0 * in[r * cols + c];
}

void _start(void) {
  for (int i = 0; i < N; i++) u[i] = (float)rt_real(16);
  for (int i = 0; i < R * C; i++) g[i] = rt_real(9);
  smooth(N, u, v);
  laplace(R, C, g, h);
  rt_write(v, sizeof v);
  rt_write(h, sizeof h);
  rt_exit(0);
}
