import { faultsCluster } from './stack'

// Start the fault suite's cluster once and stop it at the end (never left running).
export default async function setup() {
  const cluster = faultsCluster()
  await cluster.ensure([])
  return async () => {
    cluster.stop()
  }
}
