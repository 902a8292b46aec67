namespace CoefGen.Core.Tests.Toolchain;

/// <summary>A C program that feeds each vector line to &lt;prefix&gt;_apply and compares with the expected output.</summary>
public static class CHarness
{
    public static string Source(string header, string prefix) => $$"""
        #include <stdio.h>
        #include "{{header}}"

        int main(int argc, char **argv)
        {
            FILE *f;
            long n = 0, bad = 0;
            if (argc != 2 || (f = fopen(argv[1], "r")) == NULL) {
                return 2;
            }
            for (;;) {
                int32_t codes[{{prefix.ToUpperInvariant()}}_PIXEL_SAMPLES];
                long long expect, got, c;
                int i;
                if (fscanf(f, "%lld", &expect) != 1) {
                    break;
                }
                for (i = 0; i < {{prefix.ToUpperInvariant()}}_PIXEL_SAMPLES; ++i) {
                    if (fscanf(f, "%lld", &c) != 1) {
                        return 2;
                    }
                    codes[i] = (int32_t)c;
                }
                got = (long long){{prefix}}_apply(codes);
                if (got != expect) {
                    if (bad < 10) {
                        printf("mismatch line %ld: got %lld expected %lld\n", n + 1, got, expect);
                    }
                    ++bad;
                }
                ++n;
            }
            fclose(f);
            if (n == 0 || bad != 0) {
                printf("FAIL %ld of %ld\n", bad, n);
                return 1;
            }
            printf("PASS %ld\n", n);
            return 0;
        }

        """;
}
