// sum_{n < count} weights[n] exp(-lambda_n^2 Fo): every point value, mean and coefficient decay of the exact series
// (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Eq. 5.39a and its cylinder/sphere forms, from memory).

export function seriesSum(weights: ArrayLike<number>, lambdas: ArrayLike<number>, fo: number, count: number): number {
  let sum = 0;
  for (let n = 0; n < count; n++) {
    const decay = Math.exp(-lambdas[n] * lambdas[n] * fo);
    if (decay === 0) break;
    sum += weights[n] * decay;
  }
  return sum;
}
