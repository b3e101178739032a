// SHA-256 against the FIPS 180-4 example messages (NIST, "Cryptographic
// Standards and Guidelines: Examples with intermediate values", SHA-256:
// "abc", the 448-bit two-block message, and one million 'a'), the empty
// message as `sha256sum` prints it for an empty file, and the padding
// boundaries (55, 56 and 64 bytes), where a wrong padding shows first.
#include "report/sha256.hpp"

#include <doctest/doctest.h>
#include <string>

using lapwing::report::sha256_hex;

TEST_CASE("sha256: FIPS 180-4 examples") {
    CHECK(sha256_hex("abc") == "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
    CHECK(sha256_hex("abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq") ==
          "248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1");
    CHECK(sha256_hex(std::string(1000000, 'a')) ==
          "cdc76e5c9914fb9281a1c7e284d73e67f1809a48a497200e046d39ccc7112cd0");
}

TEST_CASE("sha256: empty input and padding boundaries") {
    // Empty: the well-known digest of zero bytes (sha256sum /dev/null).
    CHECK(sha256_hex("") == "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855");
    // 55 bytes is the longest message that pads into one block, 56 needs two;
    // the digests differ from each other and from 64 (one full block).
    const std::string a55(55, 'a'), a56(56, 'a'), a64(64, 'a');
    CHECK(sha256_hex(a55) != sha256_hex(a56));
    CHECK(sha256_hex(a56) != sha256_hex(a64));
    // Independent values computed with coreutils sha256sum
    // (printf 'a%.0s' {1..N} | sha256sum).
    CHECK(sha256_hex(a55) == "9f4390f8d30c2dd92ec9f095b65e2b9ae9b0a925a5258e241c9f1e910f734318");
    CHECK(sha256_hex(a56) == "b35439a4ac6f0948b6d6f9e3c6af0f5f590ce20f1bde7090ef7970686ec6738a");
    CHECK(sha256_hex(a64) == "ffe054fe7ae0cb6dc65c3af9b61d5209f439851db43d0ba5997337df154668eb");
}
