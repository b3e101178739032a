// lapwing command line (placeholder until the subcommands land).
#include <cstdio>

int main() {
    std::printf("lapwing %s (%s)\n", LAPWING_VERSION, LAPWING_BUILD_ID);
    return 0;
}
