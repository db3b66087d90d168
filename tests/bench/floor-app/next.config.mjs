// The framework's floor for the HTTP load benchmark: a Next app with nothing in it but one route handler,
// built and started by tests/bench/run.sh beside Dutywise. What the calculate route loses against it is ours.
const config = {
  poweredByHeader: false,
  eslint: { ignoreDuringBuilds: true },
};

export default config;
