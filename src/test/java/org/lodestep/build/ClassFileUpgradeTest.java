package org.lodestep.build;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.zip.ZipFile;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.objectweb.asm.ClassReader;
import org.objectweb.asm.ClassVisitor;
import org.objectweb.asm.ClassWriter;
import org.objectweb.asm.Label;
import org.objectweb.asm.MethodVisitor;
import org.objectweb.asm.Opcodes;

/**
 * The old class files of the runnable jar, rewritten as version 50 with frames, must pass the JVM's type-checking
 * verifier (JVMS 4.10.1) as they are, without its fall-back to the type-inferring one, and behave as before. The
 * checks run the JVM itself: a class made here, old style, run in a child JVM that logs its verification; and every
 * class of the command-line and maths libraries, upgraded, verified by the JVM as it makes a class-data archive.
 */
class ClassFileUpgradeTest {
    private static final Path JAVA = Path.of(System.getProperty("java.home"), "bin", "java");
    private static final ClassLoader TYPES = ClassFileUpgradeTest.class.getClassLoader();

    @TempDir
    Path dir;

    @Test
    void anOldClassBecomesVersion50WithFramesAndRunsAsBefore() throws Exception {
        byte[] old = oldClassWithBranchesAndALoop();
        assertEquals(49, ClassFileUpgrade.majorVersion(old));
        byte[] upgraded = ClassFileUpgrade.upgrade(old, TYPES);
        assertEquals(50, ClassFileUpgrade.majorVersion(upgraded));
        assertTrue(frames(upgraded) > 0, "frames written");

        Files.write(dir.resolve("Old.class"), upgraded);
        String log = run(JAVA.toString(), "-Xshare:off", "-Xlog:verification=info", "-cp", dir.toString(), "Old");
        // pick(true) + pick(false): 1 + 2 from the lists, plus 0 + 1 + 2 + 3 + 4 from the loop, each
        assertTrue(log.contains("result 23"), log);
        assertTrue(log.contains("Verifying class Old with new format"), log);
        assertFalse(log.contains("Fail over"), log);
    }

    @Test
    void aClassUsingSubroutinesIsLeftAsItWas() {
        byte[] old = oldClassWithASubroutine();
        assertArrayEquals(old, ClassFileUpgrade.upgrade(old, TYPES));
    }

    @Test
    void everyClassOfTheCommandLineAndMathsLibrariesPassesTheTypeCheckingVerifier() throws Exception {
        for (Class<?> fromJar : List.of(picocli.CommandLine.class,
                org.apache.commons.math3.linear.QRDecomposition.class)) {
            Path jar = Path.of(fromJar.getProtectionDomain().getCodeSource().getLocation().toURI());
            Path upgraded = dir.resolve(jar.getFileName());
            int[] counts = ClassFileUpgrade.upgradeJar(jar, upgraded);
            List<String> classes = classNames(upgraded);
            assertEquals(classes.size(), counts[0] + counts[1], "every class of " + jar.getFileName() + " was old");
            Path list = dir.resolve("classes.txt");
            Files.write(list, classes);
            String log = run(JAVA.toString(), "-Xshare:dump", "-Xlog:verification=info",
                    "-XX:SharedClassListFile=" + list, "-XX:SharedArchiveFile=" + dir.resolve("check.jsa"),
                    "-cp", upgraded.toString());
            // Making an archive, the JVM does not fall back: a class failing the type-checking verifier is left out.
            String failed = log.lines().filter(l -> l.contains("Verification for") || l.contains("Skipping")
                    || l.contains("Fail over")).findFirst().orElse(null);
            assertEquals(null, failed, jar.getFileName().toString());
            Matcher m = Pattern.compile("Verifying class (\\S+) with new format").matcher(log);
            List<String> verified = new ArrayList<>();
            while (m.find()) {
                verified.add(m.group(1).replace('.', '/'));
            }
            // Interfaces without code need no verification; every other class was verified the new way.
            assertTrue(verified.size() > classes.size() / 2, verified.size() + " of " + classes.size());
            assertTrue(verified.contains(fromJar.getName().replace('.', '/')), fromJar.getName());
        }
    }

    private static List<String> classNames(Path jar) throws IOException {
        List<String> names = new ArrayList<>();
        try (ZipFile z = new ZipFile(jar.toFile())) {
            z.stream().map(e -> e.getName()).filter(n -> n.endsWith(".class") && !n.startsWith("META-INF/")
                    && !n.endsWith("module-info.class")).forEach(n -> names.add(n.substring(0, n.length() - 6)));
        }
        return names;
    }

    private static String run(String... command) throws IOException, InterruptedException {
        Process p = new ProcessBuilder(command).redirectErrorStream(true).start();
        byte[] out = p.getInputStream().readAllBytes();
        assertTrue(p.waitFor(120, TimeUnit.SECONDS), "child JVM finished");
        String text = new String(out, StandardCharsets.UTF_8);
        assertEquals(0, p.exitValue(), text);
        return text;
    }

    private static int frames(byte[] classFile) {
        int[] n = {0};
        new ClassReader(classFile).accept(new ClassVisitor(Opcodes.ASM9) {
            @Override
            public MethodVisitor visitMethod(int access, String name, String descriptor, String signature,
                    String[] exceptions) {
                return new MethodVisitor(Opcodes.ASM9) {
                    @Override
                    public void visitFrame(int type, int numLocal, Object[] local, int numStack, Object[] stack) {
                        n[0]++;
                    }
                };
            }
        }, 0);
        return n[0];
    }

    /**
     * A Java 5 class file (no frames), as old compilers wrote: {@code pick(b)} builds an ArrayList or a LinkedList
     * (two types meeting at one point, so a frame must name their common superclass), adds one or two elements and
     * sums a counting loop; {@code main} prints {@code pick(true) + pick(false)}.
     */
    private static byte[] oldClassWithBranchesAndALoop() {
        ClassWriter w = new ClassWriter(ClassWriter.COMPUTE_MAXS);
        w.visit(Opcodes.V1_5, Opcodes.ACC_PUBLIC | Opcodes.ACC_SUPER, "Old", null, "java/lang/Object", null);
        MethodVisitor m = w.visitMethod(Opcodes.ACC_PUBLIC | Opcodes.ACC_STATIC, "pick", "(Z)I", null, null);
        m.visitCode();
        Label linked = new Label();
        Label built = new Label();
        m.visitVarInsn(Opcodes.ILOAD, 0);
        m.visitJumpInsn(Opcodes.IFEQ, linked);
        m.visitTypeInsn(Opcodes.NEW, "java/util/ArrayList");
        m.visitInsn(Opcodes.DUP);
        m.visitMethodInsn(Opcodes.INVOKESPECIAL, "java/util/ArrayList", "<init>", "()V", false);
        m.visitInsn(Opcodes.DUP);
        m.visitLdcInsn("a");
        m.visitMethodInsn(Opcodes.INVOKEVIRTUAL, "java/util/ArrayList", "add", "(Ljava/lang/Object;)Z", false);
        m.visitInsn(Opcodes.POP);
        m.visitJumpInsn(Opcodes.GOTO, built);
        m.visitLabel(linked);
        m.visitTypeInsn(Opcodes.NEW, "java/util/LinkedList");
        m.visitInsn(Opcodes.DUP);
        m.visitMethodInsn(Opcodes.INVOKESPECIAL, "java/util/LinkedList", "<init>", "()V", false);
        m.visitInsn(Opcodes.DUP);
        m.visitInsn(Opcodes.DUP);
        m.visitLdcInsn("a");
        m.visitMethodInsn(Opcodes.INVOKEVIRTUAL, "java/util/LinkedList", "add", "(Ljava/lang/Object;)Z", false);
        m.visitInsn(Opcodes.POP);
        m.visitLdcInsn("b");
        m.visitMethodInsn(Opcodes.INVOKEVIRTUAL, "java/util/LinkedList", "add", "(Ljava/lang/Object;)Z", false);
        m.visitInsn(Opcodes.POP);
        m.visitLabel(built);
        m.visitMethodInsn(Opcodes.INVOKEVIRTUAL, "java/util/AbstractList", "size", "()I", false);
        m.visitVarInsn(Opcodes.ISTORE, 1);
        m.visitInsn(Opcodes.ICONST_0);
        m.visitVarInsn(Opcodes.ISTORE, 2);
        Label test = new Label();
        Label body = new Label();
        m.visitJumpInsn(Opcodes.GOTO, test);
        m.visitLabel(body);
        m.visitVarInsn(Opcodes.ILOAD, 1);
        m.visitVarInsn(Opcodes.ILOAD, 2);
        m.visitInsn(Opcodes.IADD);
        m.visitVarInsn(Opcodes.ISTORE, 1);
        m.visitIincInsn(2, 1);
        m.visitLabel(test);
        m.visitVarInsn(Opcodes.ILOAD, 2);
        m.visitInsn(Opcodes.ICONST_5);
        m.visitJumpInsn(Opcodes.IF_ICMPLT, body);
        m.visitVarInsn(Opcodes.ILOAD, 1);
        m.visitInsn(Opcodes.IRETURN);
        m.visitMaxs(0, 0);
        m.visitEnd();

        MethodVisitor main = w.visitMethod(Opcodes.ACC_PUBLIC | Opcodes.ACC_STATIC, "main", "([Ljava/lang/String;)V",
                null, null);
        main.visitCode();
        main.visitFieldInsn(Opcodes.GETSTATIC, "java/lang/System", "out", "Ljava/io/PrintStream;");
        main.visitTypeInsn(Opcodes.NEW, "java/lang/StringBuilder");
        main.visitInsn(Opcodes.DUP);
        main.visitLdcInsn("result ");
        main.visitMethodInsn(Opcodes.INVOKESPECIAL, "java/lang/StringBuilder", "<init>", "(Ljava/lang/String;)V",
                false);
        main.visitInsn(Opcodes.ICONST_1);
        main.visitMethodInsn(Opcodes.INVOKESTATIC, "Old", "pick", "(Z)I", false);
        main.visitInsn(Opcodes.ICONST_0);
        main.visitMethodInsn(Opcodes.INVOKESTATIC, "Old", "pick", "(Z)I", false);
        main.visitInsn(Opcodes.IADD);
        main.visitMethodInsn(Opcodes.INVOKEVIRTUAL, "java/lang/StringBuilder", "append", "(I)Ljava/lang/StringBuilder;",
                false);
        main.visitMethodInsn(Opcodes.INVOKEVIRTUAL, "java/lang/StringBuilder", "toString", "()Ljava/lang/String;",
                false);
        main.visitMethodInsn(Opcodes.INVOKEVIRTUAL, "java/io/PrintStream", "println", "(Ljava/lang/String;)V", false);
        main.visitInsn(Opcodes.RETURN);
        main.visitMaxs(0, 0);
        main.visitEnd();
        w.visitEnd();
        return w.toByteArray();
    }

    /** A Java 5 class file whose one method calls a subroutine ({@code jsr}/{@code ret}, JVMS 4.10.2.5). */
    private static byte[] oldClassWithASubroutine() {
        ClassWriter w = new ClassWriter(ClassWriter.COMPUTE_MAXS);
        w.visit(Opcodes.V1_5, Opcodes.ACC_PUBLIC | Opcodes.ACC_SUPER, "Subroutine", null, "java/lang/Object", null);
        MethodVisitor m = w.visitMethod(Opcodes.ACC_PUBLIC | Opcodes.ACC_STATIC, "run", "()V", null, null);
        m.visitCode();
        Label sub = new Label();
        m.visitJumpInsn(Opcodes.JSR, sub);
        m.visitInsn(Opcodes.RETURN);
        m.visitLabel(sub);
        m.visitVarInsn(Opcodes.ASTORE, 0);
        m.visitVarInsn(Opcodes.RET, 0);
        m.visitMaxs(0, 0);
        m.visitEnd();
        w.visitEnd();
        return w.toByteArray();
    }
}
