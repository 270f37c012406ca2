import type { Plant } from "../plants/plant";
import type { Strategy } from "./strategy";

/** No choice to make (conventional, bev): always the plant's single candidate. */
export class FixedStrategy implements Strategy {
  readonly kind = "fixed";
  constructor(private readonly plant: Plant) {}
  reset(): void {}
  decide(k: number, _soc: number, ctl: Float64Array): void {
    this.plant.candidate(k, 0, 1, ctl);
  }
}
